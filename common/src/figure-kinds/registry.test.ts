import { describe, expect, it } from 'vitest';
import { result } from '../../test-fixtures/figure-results';
import { FIGURE_KIND_LABELS, FIGURE_KINDS, FIGURE_REGISTRY, figureRecipeSchema, figureResultSchema } from './registry';
import { DEFAULT_EVENT_SOURCE, eventRuleSchema } from './shared/recipe-parts';
import { arrayMax, numberBounds } from './shared/schema-reading';
import { lagCorrelationRecipeSchema } from './lag-correlation';

const ID = '6f1c2a9e-3b1d-4c55-9a0e-1f2d3c4b5a60';

describe('figure-kind registry', () => {
  it('lists every kind once, each with a label', () => {
    const names = FIGURE_KINDS.map((k) => k.kind);
    expect(new Set(names).size).toBe(names.length);
    expect(Object.keys(FIGURE_KIND_LABELS)).toEqual(names);
  });

  it('gives each kind a default recipe that the recipe schema accepts once its bindings are filled in', () => {
    for (const kind of FIGURE_REGISTRY.names) {
      const draft = JSON.parse(JSON.stringify(FIGURE_REGISTRY.defaultRecipe(kind)).replaceAll('"seriesId":""', `"seriesId":"${ID}"`).replaceAll('"zonalFieldId":""', `"zonalFieldId":"${ID}"`));
      const parsed = figureRecipeSchema.safeParse(draft);
      expect(parsed.success, `${kind}: ${parsed.success ? '' : parsed.error.message}`).toBe(true);
      // Every default is written out: parsing adds nothing the form would not have shown.
      expect(parsed.data).toEqual(draft);
    }
  });

  it('takes form defaults from the schema: lag 24, event rule 0.5 / 5 / 3 (NOAA CPC ONI rule), WMO 1991–2020 normal', () => {
    const lag = FIGURE_REGISTRY.defaultRecipe('lag-correlation');
    expect(lag).toMatchObject({ maxLag: 24, method: 'pearson', alpha: 0.05, significance: 'ar1', surrogates: 1000, seed: 1997, anomaly: { base: { from: '1991-01', to: '2020-12' }, smooth: 1 } });
    expect(FIGURE_REGISTRY.defaultRecipe('timeseries').events).toEqual({ from: 'rule', threshold: 0.5, minDuration: 5, smooth: 3 });
    expect(DEFAULT_EVENT_SOURCE).toEqual(eventRuleSchema.parse({ from: 'rule' }));
  });

  it('reads bounds from the schema checks, for forms', () => {
    expect(numberBounds(lagCorrelationRecipeSchema, ['maxLag'])).toEqual({ min: 0, max: 60 });
    expect(numberBounds(lagCorrelationRecipeSchema, ['anomaly', 'smooth'])).toEqual({ min: 1, max: 61 });
    // Issue 14: surrogates for pSearch, bounded like the analysis route (MAX_SURROGATES = 10 000).
    expect(numberBounds(lagCorrelationRecipeSchema, ['surrogates'])).toEqual({ min: 0, max: 10_000 });
    expect(numberBounds(FIGURE_REGISTRY.definition('composite').recipe, ['events', 'minDuration'])).toEqual({ min: 1, max: 60 });
    expect(arrayMax(FIGURE_REGISTRY.definition('budget').recipe, ['terms'])).toBe(12);
  });

  it('checks a result’s data against its kind’s result schema', () => {
    const good = result('hovmoller', { units: 'K', show: 'raw', latitudes: [0], cells: [{ month: '2000-01', lat: 0, value: null }] });
    expect(figureResultSchema.safeParse(good).success).toBe(true);
    // The same data under another kind is refused: the union is discriminated by kind.
    expect(figureResultSchema.safeParse({ ...good, kind: 'scatter' }).success).toBe(false);
    expect(figureResultSchema.safeParse(result('hovmoller', { units: 'K', cells: [] })).success).toBe(false);
  });
});
