// Damping ratio of the standard second-order step response that overshoots by
// `overshootPct` percent: zeta = -ln(OS/100) / sqrt(pi^2 + ln^2(OS/100)), the
// inverse of overshootFromDamping. Defined for 0 < overshootPct < 100; the
// result lies in (0, 1). Outside that range there is no answer: NaN.
export function dampingFromOvershoot(overshootPct: number): number {
  if (!(overshootPct > 0 && overshootPct < 100)) return Number.NaN;
  const l = Math.log(overshootPct / 100);
  return -l / Math.sqrt(Math.PI * Math.PI + l * l);
}
