import { describe, expect, it } from 'vitest';
// The expectations are the format as example-notebooks/README.md defines it (our own spec), and RFC 4122 UUIDs as ids.
import { boundIds, keyFromFile, keyRefs, keyToFile, listNumberKeys, listRecipes, mapRecipes, recipeFromFile, recipeToFile, refFromName, usedRefs, type RefTables } from './recipe-refs';

const A = '11111111-1111-4111-8111-111111111111';
const B = '22222222-2222-4222-8222-222222222222';
const F = '33333333-3333-4333-8333-333333333333';
const E = '44444444-4444-4444-8444-444444444444';

const budget = { kind: 'budget', tendency: { seriesId: A, version: 'latest' }, terms: [{ name: 'Biology', series: { seriesId: B, version: 3 } }] };
const composite = { kind: 'composite', index: { seriesId: A, version: 'latest' }, series: { seriesId: B, version: 'latest' }, events: { from: 'event-set', eventSetId: E } };
const hovmoller = { kind: 'hovmoller', zonalFieldId: F, show: 'anomaly' };
const doc = {
  type: 'doc',
  content: [
    { type: 'liveFigure', attrs: { id: 'f1', recipe: budget, caption: '' } },
    { type: 'paragraph', content: [{ type: 'text', text: 'x ' }, { type: 'liveNumber', attrs: { recipe: composite, key: `strongest.${B}.PgC`, precision: 2, figureId: null } }] },
    { type: 'liveFigure', attrs: { id: 'f2', recipe: hovmoller, caption: '' } },
    { type: 'liveFigure', attrs: { id: 'f3', recipe: null, caption: 'not yet saved' } },
  ],
};
const toRefs: RefTables = { series: new Map([[A, 'index'], [B, 'bio']]), fields: new Map([[F, 'zonal']]), eventSets: new Map([[E, 'events']]) };
const toIds: RefTables = {
  series: new Map([['index', A], ['bio', B]]),
  fields: new Map([['zonal', F]]),
  eventSets: new Map([['events', E]]),
};

describe('recipe refs', () => {
  it('lists the recipes of figures and live numbers in document order, skipping unsaved figures', () => {
    expect(listRecipes(doc).map((r) => r.kind)).toEqual(['budget', 'composite', 'hovmoller']);
  });

  it('collects every series, field and event-set id, including nested budget terms', () => {
    const ids = boundIds(listRecipes(doc));
    expect([...ids.series].sort()).toEqual([A, B]);
    expect([...ids.fields]).toEqual([F]);
    expect([...ids.eventSets]).toEqual([E]);
  });

  it('replaces ids by refs and keeps versions and every other field', () => {
    expect(recipeToFile(budget, toRefs)).toEqual({ kind: 'budget', tendency: { ref: 'index', version: 'latest' }, terms: [{ name: 'Biology', series: { ref: 'bio', version: 3 } }] });
    expect(recipeToFile(hovmoller, toRefs)).toEqual({ kind: 'hovmoller', show: 'anomaly', zonalFieldRef: 'zonal' });
    expect(recipeToFile(composite, toRefs).events).toEqual({ from: 'event-set', eventSetRef: 'events' });
  });

  it('round-trips a whole document: ids → refs → ids gives the document back', () => {
    const file = mapRecipes(doc, (r) => recipeToFile(r, toRefs), (k) => keyToFile(k, toRefs));
    expect(JSON.stringify(file)).not.toContain(A);
    const used = usedRefs(listRecipes(file));
    expect([...used.series].sort()).toEqual(['bio', 'index']);
    expect(listNumberKeys(file)).toEqual(['strongest.{bio}.PgC']);
    const back = mapRecipes(file, (r) => recipeFromFile(r, toIds), (k) => keyFromFile(k, toIds));
    expect(back).toEqual(doc);
  });

  it('reads series refs out of live-number keys and leaves keys without refs alone', () => {
    expect(keyRefs('event.1997-12.{dic-0-100m}.PgC')).toEqual(['dic-0-100m']);
    expect(keyRefs('strongest.lag')).toEqual([]);
    expect(keyToFile('strongest.lag', toRefs)).toBe('strongest.lag');
  });

  it('makes short unique refs from names, diacritics and dashes folded', () => {
    const taken = new Set<string>();
    expect(refFromName('Niño-like SST index (demo)', taken)).toBe('nino-like-sst-index-demo');
    expect(refFromName('DIC inventory 0–100 m', taken)).toBe('dic-inventory-0-100-m');
    expect(refFromName('DIC inventory 0–100 m', taken)).toBe('dic-inventory-0-100-m-2');
    expect(refFromName('°°°', taken)).toBe('ref');
  });
});
