// Every URL pattern of app/routes.ts, flattened, with what its module exports: an action (so POST
// means something) and a component (so single-fetch `.data` requests reach it). Read from the route
// config itself, so a route added there without a row in the access table fails the matrix.
import { readFileSync } from "node:fs";
import path from "node:path";
import type { RouteConfigEntry } from "@react-router/dev/routes";
import routes from "../../../app/routes";

export interface AppRoute {
  /** The pattern as React Router matches it, e.g. "/quotes/:quoteId" or "/api/v1/*". */
  pattern: string;
  file: string;
  hasAction: boolean;
  hasLoader: boolean;
  isPage: boolean;
}

function exportsFunction(source: string, name: string) {
  return new RegExp(`export\\s+(async\\s+)?function\\s+${name}\\b|export\\s+const\\s+${name}\\b`).test(source);
}

function flatten(entries: RouteConfigEntry[], parent: string): RouteConfigEntry[] {
  return entries.flatMap((entry) => {
    const joined = entry.path === undefined ? parent : `${parent.replace(/\/$/, "")}/${entry.path}`;
    const own = { ...entry, path: joined };
    return entry.children ? [own, ...flatten(entry.children, joined)] : [own];
  });
}

export function appRoutes(): AppRoute[] {
  return flatten(routes, "/").map((entry) => {
    const source = readFileSync(path.join("app", entry.file), "utf8");
    return {
      pattern: entry.path || "/",
      file: entry.file,
      hasAction: exportsFunction(source, "action"),
      hasLoader: exportsFunction(source, "loader"),
      isPage: /export\s+default\b/.test(source),
    };
  });
}

/** Which pattern React Router would pick for a concrete path (static segments beat params, splats last). */
export function patternMatches(pattern: string, pathname: string) {
  const want = pattern.split("/").filter(Boolean);
  const have = pathname.split("/").filter(Boolean);
  for (let i = 0; i < want.length; i++) {
    if (want[i] === "*") return true;
    if (i >= have.length) return false;
    if (!want[i].startsWith(":") && want[i] !== have[i]) return false;
  }
  return want.length === have.length;
}
