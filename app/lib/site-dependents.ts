// What goes with a site when it is deleted, in words for the confirm box and the flash message.

export interface SiteDependents {
  planCount: number;
  loadSheetCount: number;
  /** Quote numbers ("Q-0001") priced from any plan of the site, in number order. */
  quoteNumbers: string[];
}

/** "2 load sheets and 1 saved kit plan (with every revision)". */
export function dependentsWords(d: Pick<SiteDependents, "planCount" | "loadSheetCount">) {
  const sheets = `${d.loadSheetCount} load sheet${d.loadSheetCount === 1 ? "" : "s"}`;
  const plans = `${d.planCount} saved kit plan${d.planCount === 1 ? "" : "s"} (with every revision)`;
  return `${sheets} and ${plans}`;
}

/** Quotes keep the plan they were priced from, so the site stays while any of its plans is quoted. */
export function quotedSiteRefusal(quoteNumbers: readonly string[]) {
  const many = quoteNumbers.length > 1;
  return `This site cannot be deleted: quote${many ? "s" : ""} ${quoteNumbers.join(", ")} ${many ? "were" : "was"} priced from its kit plans, and a quote keeps the plan it was priced from.`;
}
