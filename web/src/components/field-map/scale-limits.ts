/**
 * The q-th percentile (0–100) of the present values, by linear interpolation between order
 * statistics (numpy.percentile's default "linear" method: position (n − 1)·q/100). null when no
 * value is present.
 */
export function percentile(values: ArrayLike<number | null>, q: number): number | null {
  const present: number[] = [];
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v !== null && Number.isFinite(v)) present.push(v);
  }
  if (present.length === 0) return null;
  const sorted = Float64Array.from(present).sort();
  const pos = ((sorted.length - 1) * q) / 100;
  const i = Math.floor(pos);
  return i + 1 < sorted.length ? sorted[i] + (pos - i) * (sorted[i + 1] - sorted[i]) : sorted[i];
}

/**
 * Colour limits of a map: for a diverging scale, symmetric about zero at the q-th percentile of
 * |value| (so one extreme cell does not wash the map out; design.md); for a sequential scale, the
 * (100 − q)-th and q-th percentiles of the values. null when no value is present.
 */
export function scaleLimits(values: ArrayLike<number | null>, kind: 'diverging' | 'sequential', q = 98): [number, number] | null {
  if (kind === 'diverging') {
    const abs = Array.from(values, (v) => (v === null ? null : Math.abs(v)));
    const l = percentile(abs, q);
    return l === null ? null : [-l, l];
  }
  const lo = percentile(values, 100 - q);
  const hi = percentile(values, q);
  return lo === null || hi === null ? null : [lo, hi];
}
