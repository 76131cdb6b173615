import { describe, expect, it } from 'vitest';
import { budgetColour, BUDGET_COLOURS, canonicalTerm } from './budget-colours';

describe('budget colours', () => {
  it('gives each canonical term its fixed colour whatever the spelling', () => {
    expect(canonicalTerm('Air-sea flux')).toBe('air–sea flux');
    expect(budgetColour('Air-sea flux')).toBe(BUDGET_COLOURS['air–sea flux']);
    expect(budgetColour(' Biology ')).toBe(BUDGET_COLOURS.biology);
  });

  it('keeps one colour for a term of another name, distinct from the canonical ones', () => {
    expect(budgetColour('entrainment')).toBe(budgetColour('Entrainment'));
    expect(Object.values(BUDGET_COLOURS)).not.toContain(budgetColour('entrainment'));
  });
});
