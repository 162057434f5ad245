// Standard ratings of fuses and circuit breakers, amperes.
// 15 A and up: the standard ampere ratings of NEC 240.6(A) — FROM MEMORY.
// Below 15 A: sizes commonly sold as PV string fuses (common practice, no source).
export const FUSE_RATINGS_SOURCE = "NEC 240.6(A) standard ratings from 15 A up (from memory); smaller PV string fuse sizes (common practice).";

export const STANDARD_FUSE_RATINGS_A: readonly number[] = [
  1, 2, 3, 4, 5, 6, 8, 10, 12, 15, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 90, 100, 110, 125, 150, 175, 200, 225, 250, 300, 350, 400, 450, 500, 600,
];
