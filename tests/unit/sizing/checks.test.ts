import { describe, expect, it } from "vitest";
import { blockingFailures, canBecomeQuote, overrideIssues, sortChecks } from "~/domain/sizing/checks";
import type { PlanCheck } from "~/domain/sizing/checks";

function make(id: string, kind: PlanCheck["kind"], status: PlanCheck["status"]): PlanCheck {
  return { id, kind, status, title: id, sentence: `${id} sentence`, figures: [], basis: "test" };
}

const checks = [
  make("a.safety-fail", "safety", "fail"),
  make("b.safety-warn", "safety", "warn"),
  make("c.performance-fail", "performance", "fail"),
  make("d.safety-pass", "safety", "pass"),
  make("e.advisory-warn", "advisory", "warn"),
];

describe("checks and quotes", () => {
  it("only failing safety checks block a quote", () => {
    expect(blockingFailures(checks).map((c) => c.id)).toEqual(["a.safety-fail"]);
    expect(canBecomeQuote(checks)).toBe(false);
  });

  it("an override needs a reason", () => {
    expect(canBecomeQuote(checks, [{ checkId: "a.safety-fail", reason: "  " }])).toBe(false);
    expect(canBecomeQuote(checks, [{ checkId: "a.safety-fail", reason: "Installer fits a surge arrester rated for it" }])).toBe(true);
    expect(overrideIssues(checks, [{ checkId: "a.safety-fail", reason: "" }])[0].message).toMatch(/Say why/);
    expect(overrideIssues(checks, [{ checkId: "c.performance-fail", reason: "x" }])[0].message).toMatch(/Only a failing safety check/);
    expect(overrideIssues(checks, [{ checkId: "nope", reason: "x" }])[0].message).toMatch(/no such check/);
  });

  it("lists failures first, safety first", () => {
    expect(sortChecks(checks).map((c) => c.id)).toEqual(["a.safety-fail", "c.performance-fail", "b.safety-warn", "e.advisory-warn", "d.safety-pass"]);
  });
});
