// What "meets the plan" means for a kit the optimiser offers: no check fails, and the simulated year
// stays within the unmet-load days the installer accepted. The plan itself only warns between that
// target and the failure threshold (simulation-check.ts), so an installer editing a plan still sees its
// figures; a kit offered as an alternative must meet the target. The search (report.ts) and its
// brute-force reference (tests/unit/optimiser/brute-force.ts) both decide with kitVerdict.
import type { PlanCheck } from "../../sizing/checks";
import type { KitPlan } from "../../sizing/plan-types";

export const UNMET_DAYS_CHECK_ID = "simulation.unmet-days";

/** Checks tied to a target the installer set: a kit must pass them, a warning is not enough. */
export const TARGET_CHECK_IDS: readonly string[] = [UNMET_DAYS_CHECK_ID];

export interface KitVerdict {
  meets: boolean;
  /** Some check fails. */
  failsCheck: boolean;
  /** The simulated year has more unmet-load days than the plan accepts (whether or not that also fails). */
  overUnmetDays: boolean;
}

/** The checks that keep a kit from meeting the plan: failing ones, and target checks that do not pass. */
export function missedChecks(plan: Pick<KitPlan, "checks">): PlanCheck[] {
  return plan.checks.filter((c) => c.status === "fail" || (TARGET_CHECK_IDS.includes(c.id) && c.status !== "pass"));
}

export function kitVerdict(plan: Pick<KitPlan, "checks">): KitVerdict {
  const missed = missedChecks(plan);
  return {
    meets: missed.length === 0,
    failsCheck: missed.some((c) => c.status === "fail"),
    overUnmetDays: missed.some((c) => c.id === UNMET_DAYS_CHECK_ID),
  };
}

export function meetsPlan(plan: Pick<KitPlan, "checks">): boolean {
  return kitVerdict(plan).meets;
}

function days(n: number): string {
  return `${n} unmet-load ${n === 1 ? "day" : "days"} a year`;
}

/**
 * Why the list is empty or short because of the unmet-days target, in plain words; null when the target
 * kept nothing out or the list is full.
 */
export function unmetTargetNote(counts: { listed: number; topN: number; fullChecks: number; overUnmetDays: number; acceptedDays: number }): string | null {
  const { listed, topN, fullChecks, overUnmetDays, acceptedDays } = counts;
  if (overUnmetDays === 0 || listed >= topN) return null;
  const advice = "allow more days or more autonomy";
  if (listed === 0 && overUnmetDays === fullChecks)
    return `None of the ${fullChecks} kits re-planned in full stayed within the ${days(acceptedDays)} this plan accepts; ${advice}.`;
  const which = `${overUnmetDays} of the ${fullChecks} kits re-planned in full went over the ${days(acceptedDays)} this plan accepts`;
  return listed === 0
    ? `No kit meets this plan: ${which}, and the others failed a check; ${advice}.`
    : `Only ${listed} ${listed === 1 ? "kit is" : "kits are"} listed: ${which}; ${advice} to see more.`;
}
