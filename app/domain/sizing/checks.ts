// Every sizing check is shown as pass / warn / fail with its numbers and a plain sentence.
// A failing SAFETY check blocks turning the plan into a quote until the design is fixed or the check is
// overridden with a reason that is kept.

export type CheckKind = "safety" | "performance" | "advisory";
export type CheckStatus = "pass" | "warn" | "fail";

export interface CheckFigure {
  label: string;
  value: number;
  unit: string;
}

export interface PlanCheck {
  /** Stable identifier, e.g. "array.voc-cold" — overrides are keyed by it. */
  id: string;
  kind: CheckKind;
  status: CheckStatus;
  /** Short heading, e.g. "String voltage on the coldest morning". */
  title: string;
  /** One or two plain sentences saying what was found and, when it fails, what to change. */
  sentence: string;
  figures: CheckFigure[];
  /** The rule or source behind the check. */
  basis: string;
}

export interface CheckOverride {
  checkId: string;
  reason: string;
}

export function figure(label: string, value: number, unit: string): CheckFigure {
  return { label, value, unit };
}

/** Failing safety checks that no override with a reason covers: the plan cannot become a quote. */
export function blockingFailures(checks: readonly PlanCheck[], overrides: readonly CheckOverride[] = []): PlanCheck[] {
  const overridden = new Set(overrides.filter((o) => o.reason.trim().length > 0).map((o) => o.checkId));
  return checks.filter((c) => c.kind === "safety" && c.status === "fail" && !overridden.has(c.id));
}

export function canBecomeQuote(checks: readonly PlanCheck[], overrides: readonly CheckOverride[] = []): boolean {
  return blockingFailures(checks, overrides).length === 0;
}

/** Problems with overrides themselves: empty reasons, or ids that are not failing safety checks. */
export function overrideIssues(checks: readonly PlanCheck[], overrides: readonly CheckOverride[]): { checkId: string; message: string }[] {
  const issues: { checkId: string; message: string }[] = [];
  for (const o of overrides) {
    const check = checks.find((c) => c.id === o.checkId);
    if (!check) issues.push({ checkId: o.checkId, message: "There is no such check in this plan." });
    else if (check.kind !== "safety" || check.status !== "fail") issues.push({ checkId: o.checkId, message: "Only a failing safety check needs an override." });
    else if (o.reason.trim().length === 0) issues.push({ checkId: o.checkId, message: "Say why this failing safety check is accepted." });
  }
  return issues;
}

/** Worst status first (fail, warn, pass), safety before performance before advisory — for listing. */
export function sortChecks(checks: readonly PlanCheck[]): PlanCheck[] {
  const statusRank = { fail: 0, warn: 1, pass: 2 };
  const kindRank = { safety: 0, performance: 1, advisory: 2 };
  return [...checks].sort((a, b) => statusRank[a.status] - statusRank[b.status] || kindRank[a.kind] - kindRank[b.kind]);
}
