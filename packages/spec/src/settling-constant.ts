// Settling-time constant c in Ts ~ c / sigma for a settling band in percent:
// the usual textbook 4 for a 2 % band and 3 for a 5 % band, and the envelope
// value ln(100 / band) for any other band (4.6 for 1 %).
export function settlingConstant(settlingBandPct: number): number {
  if (settlingBandPct === 2) return 4;
  if (settlingBandPct === 5) return 3;
  return Math.log(100 / settlingBandPct);
}
