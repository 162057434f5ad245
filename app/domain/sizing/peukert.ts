// Peukert's law for lead-acid (and, weakly, lithium) batteries: the faster a battery is discharged, the
// less of its rated capacity it gives. With the capacity C rated at the H-hour rate,
//   t = H·(C/(I·H))^k     (hours to empty at a steady current I),
// so the capacity actually delivered at I is I·t = C·(C/(I·H))^(k−1).
// Check value (REFERENCES): 100 Ah at the 20 h rate, k = 1.2, 10 A → 8.71 h.

export function peukertRuntimeH(capacityAh: number, hourRateH: number, currentA: number, exponent: number): number {
  if (!(currentA > 0)) return Infinity;
  return hourRateH * (capacityAh / (currentA * hourRateH)) ** exponent;
}

export function peukertDeliveredCapacityAh(capacityAh: number, hourRateH: number, currentA: number, exponent: number): number {
  if (!(currentA > 0)) return capacityAh;
  return currentA * peukertRuntimeH(capacityAh, hourRateH, currentA, exponent);
}
