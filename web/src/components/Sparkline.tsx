/** A small line of a series' shape for tables; gaps where months are missing. Decorative: the table says the numbers. */
export function Sparkline({ values, width = 120, height = 28 }: { values: (number | null)[]; width?: number; height?: number }) {
  const present = values.filter((v): v is number => v !== null);
  if (present.length < 2) return <svg width={width} height={height} aria-hidden="true" />;
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of present) (lo = Math.min(lo, v)), (hi = Math.max(hi, v));
  const span = hi - lo || 1;
  const x = (i: number) => (i / (values.length - 1)) * (width - 2) + 1;
  const y = (v: number) => height - 2 - ((v - lo) / span) * (height - 4);
  let d = '';
  let pen = false;
  values.forEach((v, i) => {
    if (v === null) return void (pen = false);
    d += `${pen ? 'L' : 'M'}${x(i).toFixed(1)} ${y(v).toFixed(1)}`;
    pen = true;
  });
  return (
    <svg width={width} height={height} aria-hidden="true" className="upwell-sparkline">
      <path d={d} fill="none" stroke="var(--accent-10)" strokeWidth="1.25" />
    </svg>
  );
}
