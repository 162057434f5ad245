// The whole corpus, family by family. Cross-origin cases come last: were one not refused, it would
// change the world the others attack (sign out a session, withdraw the sent quote).
import type { HostileCase, SeededIds } from "./hostile-corpus";
import { accountCases } from "./hostile-corpus-accounts";
import { apiCases } from "./hostile-corpus-api";
import { catalogueCases } from "./hostile-corpus-catalogue";
import { readingCases } from "./hostile-corpus-readings";
import { planCases, siteCases } from "./hostile-corpus-planning";
import { quoteCases } from "./hostile-corpus-quotes";
import { sourcingCases } from "./hostile-corpus-sourcing";
import { teamCases } from "./hostile-corpus-team";

export const CROSS_ORIGIN_FAMILY = "cross-origin writes";

export function buildHostileCorpus(ids: SeededIds): HostileCase[] {
  const all = [
    ...accountCases(ids),
    ...teamCases(ids),
    ...catalogueCases(ids),
    ...readingCases(ids),
    ...siteCases(ids),
    ...planCases(ids),
    ...sourcingCases(ids),
    ...quoteCases(ids),
    ...apiCases(ids),
  ];
  return [...all.filter((c) => c.family !== CROSS_ORIGIN_FAMILY), ...all.filter((c) => c.family === CROSS_ORIGIN_FAMILY)];
}

/** Cases per family, for the report. */
export function countByFamily(cases: HostileCase[]) {
  const counts = new Map<string, number>();
  for (const c of cases) counts.set(c.family, (counts.get(c.family) ?? 0) + 1);
  return [...counts].sort((a, b) => b[1] - a[1]);
}
