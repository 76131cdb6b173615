import { describe, expect, it } from 'vitest';
import { eventOrderProblem } from './event-order';

const warm = { phase: 'warm', start: '1997-05', end: '1998-04', label: '1997–98' };
const cold = { phase: 'cold', start: '1998-07', end: '2000-06', label: '' };

describe('eventOrderProblem()', () => {
  it('accepts an empty set, one event, and sorted events that do not touch', () => {
    expect(eventOrderProblem([])).toBeNull();
    expect(eventOrderProblem([warm])).toBeNull();
    expect(eventOrderProblem([warm, cold])).toBeNull();
  });

  it('names both events when they overlap, even by one month', () => {
    const msg = eventOrderProblem([warm, { ...cold, start: '1998-04' }]);
    expect(msg).toContain('overlap');
    expect(msg).toContain('event 1 (warm 1997-05 to 1998-04, “1997–98”)');
    expect(msg).toContain('event 2 (cold 1998-04 to 2000-06)');
  });

  it('names both events when they are out of order', () => {
    const msg = eventOrderProblem([cold, warm]);
    expect(msg).toContain('sorted');
    expect(msg).toContain('event 2 (warm');
    expect(msg).toContain('event 1 (cold');
  });
});
