import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { linearRegression, sampleStandardDeviation } from 'simple-statistics';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  anomaly,
  budget,
  composite,
  detectEvents,
  formatMonth,
  integrate,
  inventoryChange,
  lagCorrelation,
  ols,
  parseMonth,
  significanceThreshold,
  trend,
  unitFactor,
  type FigureRecipe,
  type FigureResult,
  type ImportUploadResponse,
  type UploadPreview,
} from '@upwell/common';
import { FigureCache } from '../src/figures/figure-cache';
import { loadH5wasm } from '../src/series/netcdf/load-esm';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';
import { startTestApp, type TestApp } from './test-app';
import { mulberry32 } from '@upwell/common';

// The check data are fixed by a seed on the engine's one PRNG (mulberry32, common/src/stats/prng.ts).
const seeded = mulberry32;

const START = '1985-01';
const N = 480; // 1985-01..2024-12: covers the default base period 1991–2020 entirely.
// Warm and cold bumps (peak month index, amplitude): clear events by construction.
const BUMPS: [number, number][] = [[30, 1.8], [80, -1.3], [150, 2.4], [200, -1.6], [270, 1.2], [320, -1.0], [390, 2.0], [430, -1.4]];
const enso = (t: number) => BUMPS.reduce((s, [p, a]) => s + a * Math.exp(-(((t - p) / 5) ** 2)), 0);
const TG_C_PER_MONTH_TO_PG_C_PER_YR = 12e-3;

/** A fictional index (observation) and carbon series (model output) that respond to it with lags. */
function makeData(seed = 7) {
  const rnd = seeded(seed);
  const noise = (a: number) => a * (rnd() - 0.5);
  const rows = Array.from({ length: N }, (_, t) => {
    const index = 27 + 1.2 * Math.cos((2 * Math.PI * t) / 12) + enso(t) + noise(0.15);
    const flux = 0.6 + 0.15 * Math.sin((2 * Math.PI * t) / 12) - 0.35 * enso(t - 3) + noise(0.05);
    const dic = 38 + 0.001 * t + 0.5 * enso(t - 6) + noise(0.02);
    const adv = 0.3 * Math.sin((2 * Math.PI * t) / 7);
    const bio = 10 * Math.cos((2 * Math.PI * t) / 12);
    const tendency = flux + adv + bio * TG_C_PER_MONTH_TO_PG_C_PER_YR + noise(0.01);
    // 1 Pg C/yr through 2022 (outside the base period, whose climatology is then 0): a hand check.
    const step = t >= (2022 - 1985) * 12 && t < (2023 - 1985) * 12 ? 1 : 0;
    return { month: formatMonth(parseMonth(START) + t), index, flux, dic, adv, bio, tendency, step };
  });
  return rows;
}

function csv(rows: ReturnType<typeof makeData>, cols: (keyof ReturnType<typeof makeData>[number])[]): Buffer {
  const lines = [['date', ...cols].join(','), ...rows.map((r) => [`${r.month}-15`, ...cols.map((c) => (r[c] as number).toFixed(6))].join(','))];
  return Buffer.from(lines.join('\n') + '\n');
}

/** A (time, lat, lon) NetCDF-4 file written with h5wasm: value = lat/10 + sin(2πm/12) + year index/2, equal along longitude. */
async function writeZonalTestFile(path: string): Promise<void> {
  const h5 = await loadH5wasm();
  const f = new h5.File(path, 'w');
  try {
    const months = 36;
    const lat = Float64Array.from([-15, -5, 5, 15]);
    const lon = Float64Array.from([60, 180, 300]);
    const time = Float64Array.from({ length: months }, (_, m) => m * 30 + 15); // "days since 2000-01-01", 360_day calendar
    const coord = (name: string, data: Float64Array, attrs: Record<string, string>) => {
      const d = f.create_dataset({ name, data, shape: [data.length], dtype: '<d' });
      for (const [k, v] of Object.entries(attrs)) d.create_attribute(k, v);
      d.make_scale(name);
    };
    coord('time', time, { units: 'days since 2000-01-01', calendar: '360_day', axis: 'T', standard_name: 'time' });
    coord('lat', lat, { units: 'degrees_north', standard_name: 'latitude', axis: 'Y' });
    coord('lon', lon, { units: 'degrees_east', standard_name: 'longitude', axis: 'X' });
    const data = new Float32Array(months * lat.length * lon.length);
    for (let m = 0; m < months; m++)
      for (let j = 0; j < lat.length; j++)
        for (let i = 0; i < lon.length; i++) data[(m * lat.length + j) * lon.length + i] = lat[j] / 10 + Math.sin((2 * Math.PI * m) / 12) + Math.floor(m / 12) / 2;
    const v = f.create_dataset({ name: 'dic_surface', data, shape: [months, lat.length, lon.length], dtype: '<f' });
    v.create_attribute('units', 'mol C m-3');
    v.create_attribute('long_name', 'fictional surface dissolved inorganic carbon');
    v.attach_scale(0, '/time');
    v.attach_scale(1, '/lat');
    v.attach_scale(2, '/lon');
    f.create_attribute('Conventions', 'CF-1.11');
  } finally {
    f.close();
  }
}

type Ids = { index: string; flux: string; dic: string; adv: string; bio: string; tendency: string; step: string };

describe('POST /api/notebooks/:notebookId/figures', () => {
  let t: TestApp;
  let lead: TestUser, co: TestUser, reviewer: TestUser, reader: TestUser, member: TestUser, outsider: TestUser;
  let groupId: string;
  let notebookId: string;
  let ids: Ids;
  let foreignSeriesId: string;
  let zonalFieldId: string;
  const rows = makeData();

  const upload = async (who: TestUser, gid: string, body: Buffer, name: string) =>
    (await request(t.url).post(`/api/groups/${gid}/uploads`).set(who.auth).attach('file', body, { filename: name }).expect(201)).body as UploadPreview;
  const importCols = async (who: TestUser, uploadId: string, body: object) =>
    (await request(t.url).post(`/api/uploads/${uploadId}/import`).set(who.auth).send(body).expect(200)).body as ImportUploadResponse;
  const col = (column: string, name: string, kind: string, units: string) => ({ column, skip: false, name, kind, variable: column, units });
  const figure = (who: TestUser, recipe: FigureRecipe | Record<string, unknown>, nb = notebookId) =>
    request(t.url).post(`/api/notebooks/${nb}/figures`).set(who.auth).send({ recipe });
  const ok = async (recipe: FigureRecipe) => (await figure(lead, recipe).expect(200)).body as FigureResult;
  const stored = async (id: string, version: number | 'latest' = 'latest') =>
    (await request(t.url).get(`/api/series/${id}/versions/${version}/values`).set(lead.auth).expect(200)).body as { start: string; values: (number | null)[] };
  const num = (r: FigureResult, key: string) => {
    const n = r.numbers.find((x) => x.key === key);
    if (!n) throw new Error(`no number ${key} in ${r.numbers.map((x) => x.key).join(', ')}`);
    return n.value;
  };
  const base = { from: '1991-01', to: '2020-12' };
  const ruleEvents = async (indexId: string) => {
    const idx = await stored(indexId);
    return detectEvents({ index: anomaly({ series: idx, base }).anomaly, threshold: 0.5, minDuration: 5, smooth: 3 }).events;
  };

  beforeAll(async () => {
    t = await startTestApp();
    [lead, co, reviewer, reader, member, outsider] = await Promise.all(
      ['lead', 'co', 'reviewer', 'reader', 'member', 'outsider'].map((n) => buildUser(t.url, n)),
    );
    groupId = (await buildGroup(t.url, lead, [co, reviewer, reader, member])).id;
    notebookId = (await buildNotebook(t.url, groupId, lead, [[co, 'co-author'], [reviewer, 'reviewer'], [reader, 'reader']])).id;

    const obs = await upload(lead, groupId, csv(rows, ['index']), 'index.csv');
    const idx = await importCols(lead, obs.uploadId, { origin: 'observation', columns: [col('index', 'Niño-like index', 'climate-index', 'degC')] });
    const model = await upload(lead, groupId, csv(rows, ['flux', 'dic', 'adv', 'bio', 'tendency']), 'model.csv');
    const mod = await importCols(lead, model.uploadId, {
      origin: 'model-output',
      columns: [
        col('flux', 'Outgassing', 'flux', 'Pg C/yr'),
        col('dic', 'DIC 0–100 m', 'carbon-inventory', 'Pg C'),
        col('adv', 'Advection', 'budget-term', 'Pg C/yr'),
        col('bio', 'Biology', 'budget-term', 'Tg C/month'),
        col('tendency', 'DIC tendency', 'budget-term', 'Pg C/yr'),
      ],
    });
    const stepUp = await upload(lead, groupId, csv(rows, ['step']), 'step.csv');
    const st = await importCols(lead, stepUp.uploadId, { origin: 'derived', columns: [col('step', 'Step flux', 'flux', 'Pg C/yr')] });
    const [flux, dic, adv, bio, tendency] = mod.series.map((s) => s.id);
    ids = { index: idx.series[0].id, flux, dic, adv, bio, tendency, step: st.series[0].id };

    const otherGroup = (await buildGroup(t.url, outsider, [], 'Another group')).id;
    const foreign = await upload(outsider, otherGroup, csv(rows, ['index']), 'foreign.csv');
    foreignSeriesId = (await importCols(outsider, foreign.uploadId, { columns: [col('index', 'Foreign index', 'climate-index', 'degC')] })).series[0].id;

    const dir = mkdtempSync(join(tmpdir(), 'upwell-zonal-'));
    try {
      await writeZonalTestFile(join(dir, 'zonal.nc'));
      const nc = await upload(lead, groupId, readFileSync(join(dir, 'zonal.nc')), 'zonal.nc');
      const grid = await importCols(lead, nc.uploadId, { grids: [{ variable: 'dic_surface', name: 'Surface DIC' }] });
      const red = await request(t.url).post(`/api/fields/${grid.fields[0].id}/reductions`).set(lead.auth).send({ kind: 'zonal-mean', name: 'Surface DIC, zonal mean', lon: [0, 360] }).expect(200);
      zonalFieldId = red.body.zonal.id;
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
  afterAll(() => t.close());

  it('timeseries: anomalies, OLS trend and rule events equal the engine on the stored values', async () => {
    const r = await ok({ kind: 'timeseries', series: { seriesId: ids.flux }, index: { seriesId: ids.index } });
    const flux = await stored(ids.flux);
    const a = anomaly({ series: flux, base });
    const data = r.data as { points: { month: string; value: number | null }[]; events: { phase: string; start: string; peak: string; end: string }[] };
    expect(data.points.map((p) => p.value)).toEqual(a.anomaly.values);
    expect(data.points[0].month).toBe(START);
    const events = await ruleEvents(ids.index);
    expect(data.events).toEqual(events.map((e) => ({ ...e, label: '' })));
    // By construction: four warm and four cold bumps.
    expect(num(r, 'events.warm.count')).toBe(4);
    expect(num(r, 'events.cold.count')).toBe(4);
    expect(num(r, 'trend.perDecade')).toBeCloseTo(trend({ series: a.anomaly, per: 'decade' }).slope!, 12);
    // Issue 14: OLS and AR(1)-adjusted SE and p side by side (engine trend, Santer et al. 2000).
    const t = trend({ series: a.anomaly, per: 'decade' });
    expect(num(r, 'trend.perDecadeStdErr')).toBe(t.slopeStdErr);
    expect(num(r, 'trend.perDecadeStdErrAdjusted')).toBe(t.slopeStdErrAdjusted);
    expect(num(r, 'trend.pAdjusted')).toBe(t.pAdjusted);
    expect((r.data as { trend: { pAdjusted: number } }).trend.pAdjusted).toBe(t.pAdjusted);
    expect(r.methods).toContain('Santer et al. 2000');
    expect(r.used.map((u) => [u.name, u.version, u.origin])).toEqual([['Outgassing', 1, 'model-output'], ['Niño-like index', 1, 'observation']]);
    expect(r.used[0].valuesSha256).toMatch(/^[0-9a-f]{64}$/);
    expect(r.methods).toContain('1991-01 to 2020-12');
    expect(r.methods).toContain("the operational 3-month-index rule of the US Climate Prediction Center's ONI");
    expect(r.methods).toContain('for at least 5 consecutive months');
    expect(r.methods).toContain('Outgassing v1, Niño-like index v1');
    expect(r.cautions).toContain('Model output, not observation.');
    expect(r).toMatchObject({ kind: 'timeseries', cached: false, engineVersion: expect.any(String) });
  });

  it('seasonal-cycle: per-month mean and sd over the base period match a hand tally and simple-statistics', async () => {
    const r = await ok({ kind: 'seasonal-cycle', series: { seriesId: ids.index } });
    const idx = await stored(ids.index);
    const months = (r.data as { months: { month: number; mean: number; sd: number; min: number; max: number; n: number }[] }).months;
    expect(months).toHaveLength(12);
    for (const m of months) {
      const vals = idx.values.filter((v, i) => (i % 12) + 1 === m.month && i >= 72 && i < 432) as number[]; // 1991-01 is month 72 of 1985-01
      expect(m.n).toBe(30);
      expect(m.mean).toBeCloseTo(vals.reduce((s, v) => s + v, 0) / vals.length, 12);
      expect(m.sd).toBeCloseTo(sampleStandardDeviation(vals), 12);
      expect([m.min, m.max]).toEqual([Math.min(...vals), Math.max(...vals)]);
    }
    // The index's seasonal cycle is 1.2 cos(2πm/12): peak in January, trough in July, amplitude ≈ 2.4.
    expect(num(r, 'max.month')).toBe(1);
    expect(num(r, 'min.month')).toBe(7);
    expect(num(r, 'amplitude')).toBeCloseTo(2.4, 0);
  });

  it('lag-correlation: r, n, nEff, p per lag equal lagCorrelation on the anomalies; threshold from significanceThreshold', async () => {
    const r = await ok({ kind: 'lag-correlation', index: { seriesId: ids.index }, series: { seriesId: ids.flux }, maxLag: 12 });
    const x = anomaly({ series: await stored(ids.index), base }).anomaly;
    const y = anomaly({ series: await stored(ids.flux), base }).anomaly;
    const expected = lagCorrelation({ x, y, maxLag: 12 }).lags;
    const lags = (r.data as { lags: { lag: number; r: number; n: number; nEff: number; p: number; threshold: number }[] }).lags;
    expect(lags.map(({ threshold: _t, ...rest }) => rest)).toEqual(expected);
    for (const l of lags) expect(l.threshold).toBe(significanceThreshold(l.nEff, 0.05));
    // The flux was built as −0.35 × the index 3 months earlier.
    expect(num(r, 'strongest.lag')).toBe(3);
    expect(num(r, 'strongest.r')).toBeLessThan(-0.8);
    expect(num(r, 'strongest.nEff')).toBeLessThan(num(r, 'strongest.n')!);
    expect(r.methods).toContain('nEff = n(1 − r1x r1y)/(1 + r1x r1y), Bretherton et al. 1999');
    expect(r.cautions).toContain('Correlation is not causation; significance assumes AR(1) persistence (nEff).');
    // Issue 14: per-lag p and threshold are pointwise (multiple testing across lags, Wilks 2016 BAMS) — said in methods, label and cautions.
    expect(r.methods).toContain('pointwise significance threshold');
    expect(r.methods).toContain('not corrected for the search over lags');
    expect(r.numbers.find((n) => n.key === 'strongest.p')!.label).toMatch(/^Pointwise p-value/);
    expect(r.cautions.some((c) => c.includes('pointwise'))).toBe(true);
    // pSearch is the engine's search-corrected p (Ebisuzaki 1997 surrogates) with the recipe's defaults: 1000 surrogates, seed 1997.
    const engine = lagCorrelation({ x, y, maxLag: 12, surrogates: 1000, seed: 1997 }).strongest!;
    expect(num(r, 'strongest.pSearch')).toBe(engine.pSearch);
    expect((r.data as { strongest: { pSearch: number } }).strongest.pSearch).toBe(engine.pSearch);
    // A lag built in (r < −0.8) is far beyond what the search finds by chance: hardly any of the 1000 surrogates reach it.
    expect(num(r, 'strongest.pSearch')).toBeLessThan(0.01);
    expect(r.methods).toContain('1000 phase-randomised surrogates');
    expect(r.methods).toContain('lags −12 to +12');
  });

  it('composite: warm-event composite of the DIC anomaly equals composite() at the rule events’ peaks', async () => {
    const r = await ok({ kind: 'composite', index: { seriesId: ids.index }, series: { seriesId: ids.dic }, before: 6, after: 12 });
    const warm = (await ruleEvents(ids.index)).filter((e) => e.phase === 'warm');
    const c = composite({ series: anomaly({ series: await stored(ids.dic), base }).anomaly, events: warm.map((e) => ({ at: e.peak })), before: 6, after: 12 });
    const data = r.data as { offsets: { offset: number; mean: number; lower: number; upper: number; n: number }[]; members: { value: number | null }[] };
    expect(data.offsets).toEqual(c.offsets.map((offset, j) => ({ offset, mean: c.mean[j], lower: c.lower[j], upper: c.upper[j], n: c.n[j] })));
    expect(data.members.map((m) => m.value)).toEqual(c.members.flat());
    expect(num(r, 'events.count')).toBe(4);
    // DIC was built to respond +0.5 × the index 6 months later, so the largest composite mean sits near +6.
    expect(Math.abs(num(r, 'peak.offset')! - 6)).toBeLessThanOrEqual(1);
    expect(num(r, 'peak.mean')).toBeGreaterThan(0);
    // Issue 14 item 10: a composite uses no nEff, so its cautions do not claim AR(1) persistence.
    expect(r.cautions).toContain('Correlation is not causation.');
    expect(r.cautions.join(' ')).not.toContain('nEff');
  });

  it('event-table: rate integrated, inventory differenced, a non-carbon unit null with a warning naming it', async () => {
    const r = await ok({ kind: 'event-table', index: { seriesId: ids.index }, carbon: [{ seriesId: ids.flux }, { seriesId: ids.dic }, { seriesId: ids.index }] });
    const events = await ruleEvents(ids.index);
    const fluxA = anomaly({ series: await stored(ids.flux), base }).anomaly;
    const dicA = anomaly({ series: await stored(ids.dic), base }).anomaly;
    const rowsOut = (r.data as { rows: { peak: string; start: string; end: string; carbon: Record<string, number | null> }[] }).rows;
    expect(rowsOut.map((e) => e.peak)).toEqual(events.map((e) => e.peak));
    for (const e of rowsOut) {
      expect(e.carbon[ids.flux]).toBeCloseTo(integrate({ series: fluxA, units: 'Pg C/yr', from: e.start, to: e.end }).total, 12);
      // Issue 14 item 2: from the start of the first month to the end of the last (was: end-month minus start-month anomaly).
      expect(e.carbon[ids.dic]).toBeCloseTo(inventoryChange({ series: dicA, from: e.start, to: e.end }), 12);
      expect(e.carbon[ids.index]).toBeNull();
      expect(num(r, `event.${e.peak}.${ids.flux}.PgC`)).toBe(e.carbon[ids.flux]);
    }
    expect(r.warnings.some((w) => w.includes('"degC"'))).toBe(true);
    // Strongest by |peak| is the 2.4 bump at month 150 (1997-07).
    const strongest = events.reduce((a, b) => (Math.abs(b.peakValue) > Math.abs(a.peakValue) ? b : a));
    expect(num(r, 'strongest.peakValue')).toBe(strongest.peakValue);
    expect(num(r, `strongest.${ids.flux}.PgC`)).toBe(rowsOut.find((e) => e.peak === strongest.peak)!.carbon[ids.flux]);
    // Outgassing falls during warm events (built with −0.35 × index), so its change over the strongest warm event is negative.
    expect(num(r, `strongest.${ids.flux}.PgC`)).toBeLessThan(0);
    expect(r.methods).toContain('integrating its anomaly');
    // Issue 14: the inventory's span rule is the rate's (engine inventoryChange), said in the methods.
    expect(r.methods).toContain('from the start of the first month to the end of the last, boundary values as the mean of the neighbouring monthly means');
  });

  it('event-table by hand: 1 Pg C/yr of anomaly over the 12 months of 2022 (365 days) is 365/365.25 Pg C (Julian year)', async () => {
    const set = await request(t.url)
      .post(`/api/notebooks/${notebookId}/event-sets`)
      .set(co.auth)
      .send({ name: 'Hand check', events: [{ phase: 'warm', start: '2022-01', peak: '2022-06', end: '2022-12', label: 'step' }] })
      .expect(201);
    const r = await ok({ kind: 'event-table', index: { seriesId: ids.index }, carbon: [{ seriesId: ids.step }], events: { from: 'event-set', eventSetId: set.body.id } });
    const row = (r.data as { rows: { months: number; label: string; carbon: Record<string, number> }[] }).rows[0];
    expect(row.months).toBe(12);
    expect(row.label).toBe('step');
    expect(row.carbon[ids.step]).toBeCloseTo(365 / 365.25, 12);
    expect(num(r, `event.2022-06.${ids.step}.PgC`)).toBeCloseTo(365 / 365.25, 12);
    expect(r.methods).toContain('saved event set "Hand check"');
  });

  it('budget: sum of terms, residual and its sizes equal budget() with the Tg C/month term converted to Pg C/yr', async () => {
    const r = await ok({
      kind: 'budget',
      tendency: { seriesId: ids.tendency },
      terms: [{ name: 'air–sea', series: { seriesId: ids.flux } }, { name: 'advection', series: { seriesId: ids.adv } }, { name: 'biology', series: { seriesId: ids.bio } }],
    });
    // 1 Tg C/month = 1e-3 Pg C per (1/12 Julian year) = 0.012 Pg C/yr (units module; mean month = Julian year / 12).
    expect(unitFactor('Tg C/month', 'Pg C/yr')).toBeCloseTo(TG_C_PER_MONTH_TO_PG_C_PER_YR, 15);
    const bio = await stored(ids.bio);
    const expected = budget({
      tendency: await stored(ids.tendency),
      terms: {
        'air–sea': await stored(ids.flux),
        advection: await stored(ids.adv),
        biology: { start: bio.start, values: bio.values.map((v) => v! * unitFactor('Tg C/month', 'Pg C/yr')) },
      },
    });
    const data = r.data as { months: { residual: number; sumOfTerms: number }[]; terms: { term: string }[] };
    expect(data.months.map((m) => m.residual)).toEqual(expected.residual.values);
    expect(data.months.map((m) => m.sumOfTerms)).toEqual(expected.sumOfTerms.values);
    expect(data.terms).toHaveLength(3 * N);
    expect(num(r, 'relativeResidual')).toBe(expected.relativeResidual);
    expect(num(r, 'rmsResidual')).toBe(expected.rmsResidual);
    // The residual is the 0.01-wide uniform noise: rms ≈ 0.01/√12 ≈ 0.0029 (plus CSV rounding).
    expect(num(r, 'rmsResidual')).toBeLessThan(0.005);
    expect(r.methods).toContain('Biology from Tg C/month');
  });

  it('hovmoller: raw cells are the stored zonal mean; anomalies are anomaly() of each latitude', async () => {
    const field = (await request(t.url).get(`/api/zonal-fields/${zonalFieldId}`).set(lead.auth).expect(200)).body as { latitudes: number[]; values: (number | null)[][]; start: string };
    const fieldBase = { from: '2000-01', to: '2002-12' };
    const raw = await ok({ kind: 'hovmoller', zonalFieldId, show: 'raw', base: fieldBase });
    const rawCells = (raw.data as { cells: { month: string; lat: number; value: number }[] }).cells;
    expect(rawCells).toHaveLength(36 * 4);
    expect(rawCells.map((c) => c.value)).toEqual(field.values.flat());
    // Written as lat/10 + sin(2πm/12) + year/2 in float32: the 15°N cell of 2001-04 is 1.5 + 1 + 0.5.
    expect(rawCells.find((c) => c.month === '2001-04' && c.lat === 15)!.value).toBeCloseTo(3, 6);
    const an = await ok({ kind: 'hovmoller', zonalFieldId, base: fieldBase });
    const cells = (an.data as { cells: { value: number }[] }).cells;
    field.latitudes.forEach((_, j) => {
      const expected = anomaly({ series: { start: field.start, values: field.values.map((row) => row[j]) }, base: fieldBase }).anomaly.values;
      expect(cells.filter((_, k) => k % 4 === j).map((c) => c.value)).toEqual(expected);
    });
    // Anomalies against the 3-year monthly means are −0.5, 0, +0.5 by year (the year/2 step).
    expect(cells[0].value).toBeCloseTo(-0.5, 6);
    expect(an.used).toEqual([expect.objectContaining({ seriesId: zonalFieldId, name: 'Surface DIC, zonal mean', version: 1, origin: 'derived' })]);
  });

  it('scatter: pairs (index at t, flux at t + 3) and the OLS fit equal ols() and simple-statistics', async () => {
    const r = await ok({ kind: 'scatter', index: { seriesId: ids.index }, series: { seriesId: ids.flux }, lag: 3 });
    const x = anomaly({ series: await stored(ids.index), base }).anomaly.values;
    const y = anomaly({ series: await stored(ids.flux), base }).anomaly.values;
    const pairs = x.slice(0, N - 3).map((xv, i) => [xv!, y[i + 3]!] as [number, number]);
    const points = (r.data as { points: { x: number; y: number }[] }).points;
    expect(points.map((p) => [p.x, p.y])).toEqual(pairs);
    const fit = ols(pairs.map((p) => p[0]), pairs.map((p) => p[1]));
    expect(num(r, 'slope')).toBe(fit.slope);
    expect(num(r, 'r2')).toBe(fit.r2);
    // Independent reference: simple-statistics' least-squares line.
    expect(num(r, 'slope')).toBeCloseTo(linearRegression(pairs).m, 10);
    // Built as −0.35 × index: the slope is near −0.35 Pg C/yr per degC.
    expect(num(r, 'slope')).toBeCloseTo(-0.35, 1);
    // Issue 14: the methods say which slope SE is shown (OLS, pairs independent).
    expect(r.methods).toContain('its slope standard error the OLS one (pairs taken as independent');
    // Issue 14 item 10: the scatter's OLS fit uses no nEff, so its cautions do not claim AR(1) persistence.
    expect(r.cautions).toContain('Correlation is not causation.');
    expect(r.cautions.join(' ')).not.toContain('nEff');
  });

  describe('cache', () => {
    const recipe = (): FigureRecipe => ({ kind: 'lag-correlation', index: { seriesId: ids.index }, series: { seriesId: ids.flux }, maxLag: 6 });
    let first: FigureResult;

    it('answers a repeat from the cache with the same body and cacheKey', async () => {
      const cache = t.app.get(FigureCache);
      first = await ok(recipe());
      expect(first.cached).toBe(false);
      const hits = cache.hits;
      const again = await ok(recipe());
      expect(again.cached).toBe(true);
      expect(cache.hits).toBe(hits + 1);
      expect(cache.has(first.cacheKey)).toBe(true);
      const { cached: _a, ...x } = first;
      const { cached: _b, ...y } = again;
      expect(y).toEqual(x);
      // Spelling out the defaults (alpha, method, version "latest") is the same recipe.
      const spelled = await ok({ ...recipe(), method: 'pearson', alpha: 0.05, index: { seriesId: ids.index, version: 'latest' } } as FigureRecipe);
      expect(spelled.cacheKey).toBe(first.cacheKey);
    });

    it('misses after a new version of a bound series; a pinned version keeps the old result', async () => {
      const changed = makeData(99); // different noise: a new version of the flux
      const up = await upload(lead, groupId, csv(changed, ['flux']), 'flux-release-2.csv');
      const imp = await importCols(lead, up.uploadId, { origin: 'model-output', columns: [col('flux', 'Outgassing', 'flux', 'Pg C/yr')], targets: { flux: ids.flux } });
      expect(imp.series[0]).toMatchObject({ id: ids.flux, version: 2, created: true });

      const next = await ok(recipe());
      expect(next.cached).toBe(false);
      expect(next.cacheKey).not.toBe(first.cacheKey);
      expect(next.used.find((u) => u.seriesId === ids.flux)!.version).toBe(2);
      expect(num(next, 'strongest.r')).not.toBe(num(first, 'strongest.r'));
      expect(next.methods).toContain('Outgassing v2');

      const pinned = await ok({ ...recipe(), series: { seriesId: ids.flux, version: 1 } } as FigureRecipe);
      expect(pinned.used.find((u) => u.seriesId === ids.flux)!.version).toBe(1);
      expect(pinned.numbers).toEqual(first.numbers);
      expect(pinned.data).toEqual(first.data);
    });
  });

  describe('who may compute', () => {
    const recipe = (): FigureRecipe => ({ kind: 'seasonal-cycle', series: { seriesId: ids.index } });
    it('every notebook role may compute (lead author, co-author, reviewer, reader)', async () => {
      for (const who of [lead, co, reviewer, reader]) await figure(who, recipe()).expect(200);
    });
    it('a group member without a role and an outsider get 404', async () => {
      for (const who of [member, outsider]) {
        const res = await figure(who, recipe()).expect(404);
        expect(res.body.message).toContain('notebook');
      }
    });
    it('needs sign-in', async () => {
      await request(t.url).post(`/api/notebooks/${notebookId}/figures`).send({ recipe: recipe() }).expect(401);
    });
  });

  describe('bad input', () => {
    it('an unknown kind is a 400', async () => {
      const res = await figure(lead, { kind: 'pie-chart', series: { seriesId: ids.index } }).expect(400);
      expect(res.body.message).toContain('kind');
    });
    it('a series of another group is a 404 naming the binding', async () => {
      const res = await figure(lead, { kind: 'lag-correlation', index: { seriesId: ids.index }, series: { seriesId: foreignSeriesId } }).expect(404);
      expect(res.body.message).toContain('series:');
      expect(res.body.message).toContain(foreignSeriesId);
    });
    it('a pinned version that does not exist is a 404 naming it', async () => {
      const res = await figure(lead, { kind: 'timeseries', series: { seriesId: ids.dic, version: 9 } }).expect(404);
      expect(res.body.message).toContain('there is no version 9');
      expect(res.body.message).toContain('DIC 0–100 m');
    });
    it('maxLag beyond the shared limit (60) is a 400', async () => {
      const res = await figure(lead, { kind: 'lag-correlation', index: { seriesId: ids.index }, series: { seriesId: ids.flux }, maxLag: 61 }).expect(400);
      expect(res.body.message).toContain('maxLag');
    });
    it('a zonal field of no such id is a 404; an event set of another notebook is a 404', async () => {
      await figure(lead, { kind: 'hovmoller', zonalFieldId: foreignSeriesId }).expect(404);
      const other = (await buildNotebook(t.url, groupId, lead, [], 'Another notebook')).id;
      const set = await request(t.url).post(`/api/notebooks/${other}/event-sets`).set(lead.auth).send({ name: 'Elsewhere', events: [] }).expect(201);
      const res = await figure(lead, { kind: 'timeseries', series: { seriesId: ids.index }, events: { from: 'event-set', eventSetId: set.body.id } }).expect(404);
      expect(res.body.message).toContain('event set');
    });
    it('two budget terms of one name are a 400', async () => {
      const term = { name: 'flux', series: { seriesId: ids.flux } };
      const res = await figure(lead, { kind: 'budget', tendency: { seriesId: ids.tendency }, terms: [term, term] }).expect(400);
      expect(res.body.message).toContain('"flux"');
    });
  });

  it('is listed in the OpenAPI document with its request body', async () => {
    const doc = await request(t.url).get('/api/docs/openapi.json').expect(200);
    expect(doc.body.paths['/api/notebooks/{notebookId}/figures']?.post?.requestBody).toBeDefined();
  });
});
