import { describe, expect, it } from 'vitest';
import tCdf from '@stdlib/stats-base-dists-t-cdf';
import tQuantile from '@stdlib/stats-base-dists-t-quantile';
import { studentTCdf, studentTQuantile, studentTTwoSidedP } from './student-t';

// Reference: @stdlib/stats-base-dists-t-cdf and -quantile 0.2.3 (independent implementations).
const dofs = [1, 2, 2.5, 5, 10, 28, 40.162, 118, 1000, 12000];
const ts = [-40, -6, -3.4162, -1.993, -0.5, 0, 0.1, 1, 2.228, 3.0551, 8, 25];

describe('studentTCdf()', () => {
  it('matches @stdlib t cdf to 1e-12 absolute and 1e-9 relative in the tails', () => {
    for (const dof of dofs) {
      for (const t of ts) {
        const ours = studentTCdf(t, dof);
        const ref = tCdf(t, dof);
        expect(Math.abs(ours - ref)).toBeLessThan(1e-12);
        if (t < 0 && ref > 1e-290) expect(Math.abs(ours - ref) / ref).toBeLessThan(1e-9);
      }
    }
  });

  it('is 0.5 at t = 0 and NaN for non-positive dof', () => {
    expect(studentTCdf(0, 7)).toBe(0.5);
    expect(studentTCdf(1, 0)).toBeNaN();
  });
});

describe('studentTTwoSidedP()', () => {
  it('gives the check values of check-values.json (SciPy 1.10): t = 3.4162, ν = 118 → p = 0.000872; t = 3.0551, ν = 28 → 0.00490', () => {
    expect(studentTTwoSidedP(3.4162, 118)).toBeCloseTo(0.000872, 6);
    expect(studentTTwoSidedP(3.0551, 28)).toBeCloseTo(0.0049, 5);
  });

  it('is 0 for an infinite t', () => {
    expect(studentTTwoSidedP(Infinity, 5)).toBe(0);
  });
});

describe('studentTQuantile()', () => {
  it('matches @stdlib t quantile to 1e-9 relative', () => {
    for (const dof of dofs) {
      for (const p of [1e-8, 0.001, 0.025, 0.3, 0.6, 0.975, 0.995, 0.9999]) {
        const ours = studentTQuantile(p, dof);
        const ref = tQuantile(p, dof);
        expect(Math.abs(ours - ref) / Math.abs(ref)).toBeLessThan(1e-9);
      }
    }
  });

  it('returns the textbook 97.5% point for 10 dof (2.228) and 0 at the median', () => {
    expect(studentTQuantile(0.975, 10)).toBeCloseTo(2.228139, 5);
    expect(studentTQuantile(0.5, 3)).toBe(0);
  });

  it('inverts studentTCdf', () => {
    for (const dof of [1.5, 9, 300]) {
      for (const p of [0.01, 0.2, 0.9]) expect(studentTCdf(studentTQuantile(p, dof), dof)).toBeCloseTo(p, 12);
    }
  });
});
