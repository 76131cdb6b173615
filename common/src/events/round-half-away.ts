/**
 * Rounds to `decimals` places, half away from zero, as a person reading the decimal would.
 * Binary doubles rarely hold the decimal exactly (0.45 is 0.450000000000000011…, and 0.15 × 3
 * computes to 0.44999999999999996), so the value is first reduced to 15 significant
 * digits — the precision to which a double round-trips any decimal — and the scaled value again,
 * before the half is decided. Thus 0.45 → 0.5, −0.45 → −0.5, 1.005 → 1.01, 0.44999999 → 0.4.
 */
export function roundHalfAway(value: number, decimals: number): number {
  if (!Number.isFinite(value)) return value;
  const factor = Math.pow(10, decimals);
  const scaled = Number((Number(value.toPrecision(15)) * factor).toPrecision(15));
  const rounded = Math.sign(scaled) * Math.floor(Math.abs(scaled) + 0.5);
  // Dividing the integer by 10^d gives the double nearest the decimal result.
  return rounded / factor + 0;
}
