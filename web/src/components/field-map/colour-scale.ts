/** An RGB colour, 0–255 per channel. */
export type Rgb = [number, number, number];

// Stops of a blue–white–red diverging ramp (after ColorBrewer RdBu, Brewer 2002, colour-blind safe),
// cold (negative) to warm (positive), white at zero so the sign reads in greyscale as dark–light–dark.
const DIVERGING: Rgb[] = [[5, 48, 97], [67, 147, 195], [209, 229, 240], [247, 247, 247], [253, 219, 199], [214, 96, 77], [103, 0, 31]];
// A light-to-dark teal ramp for means (sequential), lightness falling monotonically.
const SEQUENTIAL: Rgb[] = [[247, 252, 240], [204, 235, 197], [123, 204, 196], [43, 140, 190], [8, 64, 129]];

/** Colour of t ∈ [0, 1] along a list of stops, linearly between neighbours; clamped. */
function ramp(stops: Rgb[], t: number): Rgb {
  const x = Math.min(1, Math.max(0, t)) * (stops.length - 1);
  const i = Math.min(stops.length - 2, Math.floor(x));
  const f = x - i;
  const a = stops[i];
  const b = stops[i + 1];
  return [Math.round(a[0] + f * (b[0] - a[0])), Math.round(a[1] + f * (b[1] - a[1])), Math.round(a[2] + f * (b[2] - a[2]))];
}

/** Colour of a value on a scale [lo, hi]: diverging scales put white at the middle (zero for symmetric limits). */
export function colourOf(value: number, lo: number, hi: number, kind: 'diverging' | 'sequential'): Rgb {
  const t = hi > lo ? (value - lo) / (hi - lo) : 0.5;
  return ramp(kind === 'diverging' ? DIVERGING : SEQUENTIAL, t);
}

/** CSS stops for the legend's gradient bar, left (lo) to right (hi). */
export function legendStops(kind: 'diverging' | 'sequential'): { offset: number; colour: string }[] {
  const stops = kind === 'diverging' ? DIVERGING : SEQUENTIAL;
  return stops.map((c, i) => ({ offset: i / (stops.length - 1), colour: `rgb(${c[0]},${c[1]},${c[2]})` }));
}
