/** A latitude as "20°N", "20°S" or "0°". */
export function latitudeLabel(lat: number): string {
  const v = Math.round(lat * 100) / 100;
  return v === 0 ? '0°' : `${Math.abs(v)}°${v > 0 ? 'N' : 'S'}`;
}

/** A longitude (any turn) as "150°E", "120°W", "0°" or "180°". */
export function longitudeLabel(lon: number): string {
  const v = Math.round(((((lon + 180) % 360) + 360) % 360 - 180) * 100) / 100;
  if (v === 0) return '0°';
  if (v === -180) return '180°';
  return `${Math.abs(v)}°${v > 0 ? 'E' : 'W'}`;
}

/** Round-number ticks inside [lo, hi]: a step of 10°, 30° or 60° giving at most `most` ticks. */
export function degreeTicks(lo: number, hi: number, most = 7): number[] {
  const step = [5, 10, 20, 30, 60, 90].find((s) => (hi - lo) / s <= most - 1) ?? 90;
  const out: number[] = [];
  for (let t = Math.ceil(lo / step) * step; t <= hi + 1e-9; t += step) out.push(t);
  return out;
}
