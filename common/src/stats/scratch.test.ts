import { describe, expect, it } from 'vitest';
import { scratchFloat64, scratchSlot } from './scratch';

describe('scratchFloat64()', () => {
  it('returns views of exactly n doubles on one reused buffer, growing it when needed', () => {
    const slot = scratchSlot();
    const a = scratchFloat64(slot, 10);
    expect(a.length).toBe(10);
    const b = scratchFloat64(slot, 5, 3);
    expect(b.length).toBe(5);
    expect(b.buffer).toBe(a.buffer);
    const c = scratchFloat64(slot, 100);
    expect(c.length).toBe(100);
    expect(slot.buffer.length).toBeGreaterThanOrEqual(100);
  });
});
