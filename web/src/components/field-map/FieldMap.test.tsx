import { render } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { FieldMap } from './FieldMap';

// A made-up 10° map of the tropical Pacific (descending latitudes, longitudes unwrapped across 180°):
// values a smooth pattern with land cells missing, every third cell flagged significant.
const lat = [25, 15, 5, -5, -15, -25];
const lon = Array.from({ length: 14 }, (_, i) => 125 + 10 * i);
const values = lat.flatMap((la, r) => lon.map((lo, i) => (r === 0 && i < 2 ? null : Math.cos((la * Math.PI) / 60) * Math.sin((lo * Math.PI) / 90))));
const significant = values.map((v, k) => v !== null && k % 3 === 0);
const map = { lat, lon, values, significant, units: '1' };
const c = { fdr: { significant } };

describe('FieldMap', () => {
  it('draws the field as one raster image, never a shape per cell, under land and coastlines', () => {
    const { container } = render(<FieldMap map={map} scale="diverging" title="Correlation with the index" />);
    expect(container.querySelectorAll('image')).toHaveLength(1);
    expect(container.querySelector('image')!.getAttribute('href')).toMatch(/^data:image\/png;base64,/);
    expect(container.querySelectorAll('rect').length).toBeLessThanOrEqual(3); // clip box, frame, legend bar
    expect(container.querySelector('[data-layer="coastline"]')!.getAttribute('d')!.length).toBeGreaterThan(100);
    expect(container.querySelector('svg')!.getAttribute('aria-label')).toBe('Correlation with the index');
  });

  it('stipples exactly the cells flagged significant', () => {
    const { container } = render(<FieldMap map={map} scale="diverging" />);
    const dots = container.querySelector('[data-layer="stippling"]')!.getAttribute('d')!.match(/M/g)!.length;
    expect(dots).toBe(c.fdr!.significant.filter(Boolean).length);
  });

  it('states symmetric limits and the percentile behind them in the legend, with degree ticks', () => {
    const { container } = render(<FieldMap map={map} scale="diverging" percentile={95} />);
    const legend = container.querySelector('[data-layer="legend"]')!.textContent!;
    const [lo, , hi] = [...container.querySelectorAll('[data-layer="legend"] text')].map((t) => t.textContent);
    expect(Number(lo)).toBe(-Number(hi));
    expect(legend).toMatch(/95th percentile of \|value\|/);
    expect(container.textContent).toMatch(/30°N/);
    expect(container.textContent).toMatch(/150°W/);
  });
});
