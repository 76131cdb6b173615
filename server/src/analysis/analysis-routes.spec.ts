import { describe, expect, it } from 'vitest';
import { ANALYSIS_ROUTES } from './analysis-routes';

// Moved with the run functions from common/src/api/analysis.test.ts (issue 13 item 4); same checks. The
// Niño 1+2 fixture lives outside the server's rootDir, so a deterministic SST-like series stands in.
const nino = { start: '1950-01', values: Array.from({ length: 732 }, (_, i) => 23 + 2.5 * Math.cos((2 * Math.PI * (i - 2)) / 12) + Math.sin(i * 0.37) + 0.8 * Math.sin(i / 23)) };
const bodies: Record<keyof typeof ANALYSIS_ROUTES, unknown> = {
  anomaly: { series: nino, base: { from: '1971-01', to: '2000-12' }, smooth: 3, standardize: true },
  'lag-correlation': { x: nino, y: { start: '1951-01', values: nino.values.slice(0, 400) }, maxLag: 24, surrogates: 100 },
  events: { index: { start: '2000-01', values: [0.6, 0.7, 0.8, 0.9, 0.7, 0.2] } },
  composite: { series: nino, events: [{ at: '1982-12' }, { at: '1997-12' }], before: 12, after: 12 },
  trend: { series: nino, per: 'decade' },
  budget: { tendency: { start: '2000-01', values: [1, 2, null] }, terms: { flux: { start: '2000-01', values: [1, 1, 1] } } },
  integrate: { series: { start: '2001-01', values: [2, 2, 2] }, units: 'PgC/yr', from: '2001-01', to: '2001-03', calendar: 'noleap' },
};

describe('ANALYSIS_ROUTES', () => {
  it('has the seven routes anomaly, lag-correlation, events, composite, trend, budget, integrate', () => {
    expect(Object.keys(ANALYSIS_ROUTES).sort()).toEqual(['anomaly', 'budget', 'composite', 'events', 'integrate', 'lag-correlation', 'trend']);
  });

  for (const name of Object.keys(ANALYSIS_ROUTES) as (keyof typeof ANALYSIS_ROUTES)[]) {
    it(`${name}: a valid body parses, runs, and the result passes the response schema and contains no NaN in JSON`, () => {
      const route = ANALYSIS_ROUTES[name];
      const body = route.request.parse(bodies[name]);
      const result = (route.run as (b: unknown) => unknown)(body);
      expect(route.response.safeParse(result).success).toBe(true);
      expect(JSON.stringify(result)).not.toMatch(/NaN|Infinity/);
    });
  }
});
