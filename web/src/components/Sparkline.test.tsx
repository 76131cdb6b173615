import { render } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { Sparkline } from './Sparkline';

describe('Sparkline', () => {
  it('draws one path, breaking it where a month is missing', () => {
    const { container } = render(<Sparkline values={[1, 2, null, 3, 4]} width={100} height={20} />);
    const d = container.querySelector('path')!.getAttribute('d')!;
    // Two pen-down moves: one before the gap, one after it.
    expect(d.match(/M/g)).toHaveLength(2);
    expect(d.match(/L/g)).toHaveLength(2);
  });

  it('draws nothing for fewer than two values, and a flat line for a constant series', () => {
    expect(render(<Sparkline values={[5]} />).container.querySelector('path')).toBeNull();
    const flat = render(<Sparkline values={[2, 2, 2]} width={10} height={10} />).container.querySelector('path')!.getAttribute('d')!;
    const ys = [...flat.matchAll(/[ML][\d.]+ ([\d.]+)/g)].map((m) => m[1]);
    expect(new Set(ys).size).toBe(1);
  });
});
