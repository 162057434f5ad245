// The one rule the search and its brute-force reference share: no failing check, and the simulated
// year within the plan's accepted unmet-load days (a "warn" there is not enough).
import { describe, expect, it } from "vitest";
import type { PlanCheck } from "~/domain/sizing/checks";
import { kitVerdict, missedChecks, unmetTargetNote } from "~/domain/sourcing/alternatives/meets-plan";

function plan(...checks: [string, PlanCheck["status"]][]): { checks: PlanCheck[] } {
  return { checks: checks.map(([id, status]) => ({ id, status, kind: "performance", title: id, sentence: "", figures: [], basis: "" })) };
}

describe("what meets the plan", () => {
  it("takes warnings on ordinary checks, but not over the unmet-days target", () => {
    expect(kitVerdict(plan(["array.energy", "warn"], ["simulation.unmet-days", "pass"]))).toEqual({ meets: true, failsCheck: false, overUnmetDays: false });
    expect(kitVerdict(plan(["array.energy", "pass"], ["simulation.unmet-days", "warn"]))).toEqual({ meets: false, failsCheck: false, overUnmetDays: true });
    expect(kitVerdict(plan(["array.area", "fail"], ["simulation.unmet-days", "pass"]))).toEqual({ meets: false, failsCheck: true, overUnmetDays: false });
    expect(missedChecks(plan(["array.area", "fail"], ["simulation.unmet-days", "fail"])).map((c) => c.id)).toEqual(["array.area", "simulation.unmet-days"]);
  });

  it("explains an empty or short list by the target, and says nothing when the target kept nothing out", () => {
    expect(unmetTargetNote({ listed: 0, topN: 10, fullChecks: 72, overUnmetDays: 72, acceptedDays: 0 })).toBe(
      "None of the 72 kits re-planned in full stayed within the 0 unmet-load days a year this plan accepts; allow more days or more autonomy.",
    );
    expect(unmetTargetNote({ listed: 0, topN: 10, fullChecks: 20, overUnmetDays: 15, acceptedDays: 1 })).toBe(
      "No kit meets this plan: 15 of the 20 kits re-planned in full went over the 1 unmet-load day a year this plan accepts, and the others failed a check; allow more days or more autonomy.",
    );
    expect(unmetTargetNote({ listed: 1, topN: 10, fullChecks: 20, overUnmetDays: 15, acceptedDays: 2 })).toMatch(/^Only 1 kit is listed: 15 of the 20/);
    expect(unmetTargetNote({ listed: 10, topN: 10, fullChecks: 40, overUnmetDays: 30, acceptedDays: 0 })).toBeNull();
    expect(unmetTargetNote({ listed: 3, topN: 10, fullChecks: 5, overUnmetDays: 0, acceptedDays: 0 })).toBeNull();
  });
});
