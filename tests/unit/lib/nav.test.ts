// The main navigation per role: each role sees exactly its sections, anonymous visitors see none, and
// every link leads to a page that app/routes.ts builds (issue 2: sections not built are not shown).
import { existsSync, readFileSync } from "node:fs";
import type { RouteConfigEntry } from "@react-router/dev/routes";
import { describe, expect, it } from "vitest";
import routes from "../../../app/routes";
import { NAV_ITEMS, navFor } from "~/lib/nav";
import { ROLE_LIST } from "~/lib/roles";

const EXPECTED = {
  installer: [
    ["Catalogue", "/catalogue"],
    ["Site yield", "/yield"],
    ["Field readings", "/readings"],
    ["Sites", "/sites"],
    ["Kit plans", "/plans"],
    ["Sourcing", "/sourcing"],
    ["Quotes", "/quotes"],
    ["Team", "/team"],
  ],
  curator: [
    ["Catalogue", "/catalogue"],
    ["Site yield", "/yield"],
    ["Review", "/review"],
  ],
  admin: [
    ["Catalogue", "/catalogue"],
    ["Site yield", "/yield"],
    ["Users", "/admin/users"],
  ],
  customer: [["Your quotes", "/my-quotes"]],
} as const;

function flatten(entries: RouteConfigEntry[], parent = ""): { path: string; file: string }[] {
  return entries.flatMap((entry) => {
    const path = entry.index ? parent : [parent, entry.path].filter(Boolean).join("/");
    return [{ path: `/${path}`, file: entry.file }, ...flatten(entry.children ?? [], path)];
  });
}

describe("navFor", () => {
  it.each(ROLE_LIST)("gives the %s exactly their sections, in order", (role) => {
    expect(navFor(role).map((item) => [item.label, item.to])).toEqual(EXPECTED[role]);
  });

  it("shows no sections to a visitor who is not signed in", () => {
    expect(navFor(null)).toEqual([]);
  });

  it("links no section that no role sees, and no path twice", () => {
    expect(NAV_ITEMS.every((item) => item.roles.length > 0)).toBe(true);
    expect(new Set(NAV_ITEMS.map((item) => item.to)).size).toBe(NAV_ITEMS.length);
  });

  it("links only pages that app/routes.ts builds", () => {
    const built = flatten(routes);
    for (const item of NAV_ITEMS) {
      // An exact, parameter-free path: the catch-all 404 route must not be what answers it.
      const route = built.find((r) => r.path === item.to);
      expect(route, `${item.label} → ${item.to}`).toBeDefined();
      const file = `app/${route!.file}`;
      expect(existsSync(file), file).toBe(true);
      // A page, not a resource route: it renders a component.
      expect(readFileSync(file, "utf8"), file).toMatch(/export default function/);
    }
  });
});
