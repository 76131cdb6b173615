import { describe, expect, it } from 'vitest';
import { gridsReference } from '../../test-fixtures/grids-reference';
import { PGC_PER_MOL, PGC_PER_YEAR_PER_MOL_PER_SECOND, regionalBudget, type BudgetRole } from './regional-budget';

const ref = gridsReference();
const ROLE: Record<string, BudgetRole> = { dic_tend: 'tendency', dic_adv: 'advection', dic_dif: 'diffusion', dic_bio: 'biology', dic_airsea: 'air-sea-flux', dic_other: 'other' };
const termsOf = (byName: Record<string, number[]>) => Object.entries(byName).map(([name, values]) => ({ role: ROLE[name], name, values, sign: 1 as const }));

describe('regionalBudget()', () => {
  it('closes the conservative synthetic budget to 1e-10 relative in every region and depth range (xarray integrals, scripts/grids_reference.py)', () => {
    for (const [name, r] of Object.entries(ref.regions)) {
      for (const byName of [r.full_depth_mol_s, r.top_100m_mol_s]) {
        const b = regionalBudget(termsOf(byName));
        expect(b.relativeClosure!, name).toBeLessThan(1e-10);
      }
    }
  });

  it('sees advection + diffusion cancel over the whole ocean at full depth (common practice: circulation moves carbon, it creates none)', () => {
    const g = ref.global_full_depth_mol_s;
    const scale = Math.max(...g.dic_tend.map(Math.abs));
    for (let t = 0; t < ref.nt; t++) expect(Math.abs(g.dic_adv[t] + g.dic_dif[t]) / scale).toBeLessThan(1e-10);
    expect(regionalBudget(termsOf(g)).relativeClosure!).toBeLessThan(1e-10);
  });

  it('applies each term\'s sign convention: an upward flux stored positive out of the ocean counts as a loss', () => {
    const b = regionalBudget([
      { role: 'tendency', name: 'tend', values: [1, 2], sign: 1 },
      { role: 'air-sea-flux', name: 'fgco2_up', values: [-3, -1], sign: -1 },
      { role: 'biology', name: 'bio', values: [-2, 1], sign: 1 },
    ]);
    expect(Array.from(b.terms[0].values)).toEqual([3, 1]);
    expect(Array.from(b.residual)).toEqual([0, 0]);
    expect(b.relativeClosure).toBe(0);
  });

  it('shows a missing term as a residual, NaN where an input is missing, null closure for a zero tendency', () => {
    const b = regionalBudget([
      { role: 'tendency', name: 't', values: [4, Number.NaN], sign: 1 },
      { role: 'advection', name: 'a', values: [3, 1], sign: 1 },
    ]);
    expect(b.residual[0]).toBe(1);
    expect(b.residual[1]).toBeNaN();
    expect(b.relativeClosure).toBe(0.25);
    expect(regionalBudget([{ role: 'tendency', name: 't', values: [0], sign: 1 }]).relativeClosure).toBeNull();
  });

  it('needs exactly one tendency and series of one length', () => {
    expect(() => regionalBudget([{ role: 'advection', name: 'a', values: [1], sign: 1 }])).toThrow(/exactly one tendency/);
    expect(() => regionalBudget([{ role: 'tendency', name: 't', values: [1], sign: 1 }, { role: 'other', name: 'o', values: [1, 2], sign: 1 }])).toThrow(/"o" has 2 time steps/);
  });

  it('converts mol C s-1 to Pg C yr-1 with 12.011 g/mol and the Julian year: 1 Pg C yr-1 ≈ 2.638e6 mol s-1 (science.md: 1 PgC ≈ 8.3257e13 mol C)', () => {
    expect(1 / PGC_PER_MOL).toBeCloseTo(8.3257e13, -10);
    expect(1 / PGC_PER_YEAR_PER_MOL_PER_SECOND).toBeCloseTo(8.3257e13 / 31557600, -2);
  });
});
