// The cheapest candidates seen so far, kept sorted and bounded: a candidate dearer than the last kept
// one is dropped with one comparison, which is what keeps the search's inner loop cheap.

export interface Candidate {
  totalMinor: number;
  moduleCount: number;
  modulesInSeries: number;
  stringsInParallel: number;
  batteryStrings: number;
  /** Indexes of module, controller, battery, inverter (−1: none) in the search's lists. */
  mi: number;
  ci: number;
  bi: number;
  ii: number;
  moduleCostMinor: number;
  batteryCount: number;
  batteryCostMinor: number;
}

/** Cheaper first; then fewer modules, fewer strings, fewer battery strings; then list order (stable and total). */
export function compareCandidates(a: Candidate, b: Candidate): number {
  return (
    a.totalMinor - b.totalMinor ||
    a.moduleCount - b.moduleCount ||
    a.stringsInParallel - b.stringsInParallel ||
    a.batteryStrings - b.batteryStrings ||
    a.mi - b.mi ||
    a.ci - b.ci ||
    a.bi - b.bi ||
    a.ii - b.ii
  );
}

export class TopList {
  readonly items: Candidate[] = [];
  constructor(private readonly capacity: number) {}

  /** Worth building a Candidate for? (a cheap test on the total alone) */
  admits(totalMinor: number): boolean {
    return this.items.length < this.capacity || totalMinor <= this.items[this.items.length - 1].totalMinor;
  }

  add(candidate: Candidate): void {
    const items = this.items;
    let lo = 0;
    let hi = items.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (compareCandidates(items[mid], candidate) <= 0) lo = mid + 1;
      else hi = mid;
    }
    if (lo >= this.capacity) return;
    items.splice(lo, 0, candidate);
    if (items.length > this.capacity) items.pop();
  }
}
