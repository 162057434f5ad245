// The list of checks as a reader meets it: status in words, failures first, overrides written beside
// the failure they accept.
import { createElement } from "react";
import { describe, expect, it } from "vitest";
import { PlanChecks } from "~/components/plans/plan-checks";
import type { PlanCheck } from "~/domain/sizing/checks";
import { threePlans } from "./plan-render-fixtures";
import { countMatches, markup, textOf } from "./render";

const { passing, failing, dcOnly } = threePlans();

function article(html: string, checkId: string): string {
  const start = html.indexOf(`data-check-id="${checkId}"`);
  if (start < 0) throw new Error(`no check ${checkId} in the markup`);
  return html.slice(html.indexOf(">", start) + 1, html.indexOf("</article>", start));
}

describe("PlanChecks", () => {
  it("shows every check once, with its status in words and an icon", () => {
    for (const plan of [passing, failing, dcOnly]) {
      const html = markup(PlanChecks, { checks: plan.checks });
      expect(countMatches(html, /data-check-id="/)).toBe(plan.checks.length);
      for (const check of plan.checks) {
        const text = textOf(article(html, check.id));
        const word = { pass: "✓ Pass", warn: "⚠ Warning", fail: "✕ Fail" }[check.status];
        expect(text, check.id).toContain(word);
        expect(text).toContain(check.title);
        expect(text).toContain(`Basis: ${check.basis}`);
      }
    }
  });

  it("puts failures first and says a failing safety check blocks the quote", () => {
    const html = markup(PlanChecks, { checks: failing.checks });
    const voc = failing.checks.find((c) => c.id === "array.voc-cold")!;
    expect(voc.status).toBe("fail");
    const firstId = /data-check-id="([^"]+)"/.exec(html)![1];
    expect(firstId).toBe("array.voc-cold"); // failing safety before failing performance
    const text = textOf(html);
    expect(text).toContain("Failing (");
    expect(text).toContain("1 failing safety check stops this plan from becoming a quote");
    expect(textOf(article(html, voc.id))).toContain("✕ Fail Safety String voltage on the coldest morning");
    expect(textOf(article(html, voc.id))).toContain(voc.sentence);
  });

  it("prints each figure with its unit and a sensible precision", () => {
    const html = markup(PlanChecks, { checks: failing.checks });
    const text = textOf(article(html, "array.voc-cold"));
    expect(text).toContain("Controller maximum PV voltage 100 V");
    expect(text).toMatch(/String Voc, coefficient 101\.7 V/); // 4 × 22.1 × 1.15 = 101.66 (kit-plan.test.ts)
  });

  it("keeps an accepted failure shown as a failure, with who accepted it, why and when", () => {
    const overrides = [{ checkId: "array.voc-cold", reason: "A 150 V controller is fitted on site", byName: "Maren Oakes", at: "2026-12-01T09:15:00Z" }];
    const html = markup(PlanChecks, { checks: failing.checks, overrides });
    const text = textOf(article(html, "array.voc-cold"));
    expect(text).toContain("✕ Fail");
    expect(text).toContain("Accepted anyway: A 150 V controller is fitted on site — Maren Oakes, 1 Dec 2026");
    expect(textOf(html)).toContain("No failing safety check stands in the way of a quote.");
  });

  it("ignores an override without a reason", () => {
    const html = markup(PlanChecks, {
      checks: failing.checks,
      overrides: [{ checkId: "array.voc-cold", reason: "   ", byName: "Maren Oakes", at: "2026-12-01" }],
    });
    expect(html).not.toContain("Accepted anyway");
    expect(textOf(html)).toContain("1 failing safety check stops");
  });

  it("offers the override form under failing safety checks only", () => {
    const asked: string[] = [];
    const overrideForm = (check: PlanCheck) => {
      asked.push(check.id);
      return createElement("form", { "data-form-for": check.id });
    };
    const html = markup(PlanChecks, { checks: failing.checks, overrideForm });
    const expected = failing.checks.filter((c) => c.kind === "safety" && c.status === "fail").map((c) => c.id);
    expect(expected.length).toBeGreaterThan(0);
    expect(asked.sort()).toEqual([...expected].sort());
    expect(countMatches(html, /data-form-for="/)).toBe(expected.length);
    expect(markup(PlanChecks, { checks: passing.checks, overrideForm })).not.toContain("data-form-for");
  });

  it("says a DC-only kit needs no inverter", () => {
    const text = textOf(article(markup(PlanChecks, { checks: dcOnly.checks }), "inverter.present"));
    expect(text).toContain("✓ Pass");
    expect(text).toContain("no inverter is needed");
  });
});
