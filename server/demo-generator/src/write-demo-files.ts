import { createHash } from 'node:crypto';
import { mkdir, readFile, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { BUDGET_DECIMALS } from './carbon-budget';
import { BUDGET_COLUMNS, DEMO_END, DEMO_FILES, demoCatalogue, type DemoFileEntry, type DemoManifest } from './demo-manifest';
import { DEMO_MODEL_RUN, DEMO_YEARS, generateDemoScenario, type DemoRelease, type DemoScenario } from './demo-scenario';
import { DEMO_SEED } from './random-stream';
import { writeFieldNetcdf4 } from './write-netcdf4';

/** The date each release is stamped with inside its NetCDF-4 file (invented release dates). */
export const RELEASE_DATES: Record<DemoRelease, string> = { 1: '2026-01-15T00:00:00Z', 2: '2026-03-02T00:00:00Z' };

/** Options of writeDemoFiles(). */
export interface WriteDemoOptions {
  seed?: number;
  release: DemoRelease;
}

/**
 * Writes the demo's files into `dir` (created if missing) — index.csv, carbon-budget.csv,
 * dic-inventory.csv (long layout, `time` as YYYY-MM) and surface-dic.nc (NetCDF-4) — and returns
 * the manifest: each series' file, column, name, kind, units, origin and description, the field,
 * and every file's sha256. The same seed and release give byte-identical files.
 */
export async function writeDemoFiles(dir: string, options: WriteDemoOptions): Promise<DemoManifest> {
  const s = generateDemoScenario({ seed: options.seed ?? DEMO_SEED, release: options.release });
  await mkdir(dir, { recursive: true });
  await writeFile(join(dir, DEMO_FILES.index), csv(s, ['value'], [s.index], 3));
  await writeFile(join(dir, DEMO_FILES.budget), csv(s, BUDGET_COLUMNS.map((c) => c.column), BUDGET_COLUMNS.map((c) => s.budget[c.term]), BUDGET_DECIMALS));
  await writeFile(join(dir, DEMO_FILES.inventory), csv(s, ['dic_0_100m', 'dic_full_depth'], [s.inventories.upper, s.inventories.fullDepth], BUDGET_DECIMALS));
  const { series, fields } = demoCatalogue(s.release);
  const field = fields[0];
  await writeFieldNetcdf4(join(dir, DEMO_FILES.field), s.field, {
    variable: field.variable,
    longName: field.longName,
    units: field.units,
    startYear: DEMO_YEARS.from,
    stampedAt: new Date(RELEASE_DATES[s.release]),
    global: {
      title: `Surface DIC, ${DEMO_MODEL_RUN}, release ${s.release} (synthetic)`,
      institution: 'none (invented for the Upwell demo)',
      source: `synthetic: Upwell demo generator, seed ${s.seed}, driven by a stochastic recharge oscillator (Jin 1997); not real model output or observations`,
      history: `${RELEASE_DATES[s.release].slice(0, 10)} written by server/src/demo/generator (release ${s.release})`,
    },
  });
  const files: DemoFileEntry[] = [];
  for (const file of Object.values(DEMO_FILES)) {
    const bytes = await readFile(join(dir, file));
    files.push({ file, bytes: bytes.length, sha256: createHash('sha256').update(bytes).digest('hex') });
  }
  const manifest: DemoManifest = { seed: s.seed, release: s.release, modelRun: DEMO_MODEL_RUN, start: s.start, end: DEMO_END, files, series, fields };
  await writeFile(join(dir, 'manifest.json'), `${JSON.stringify(manifest, null, 2)}\n`);
  return manifest;
}

/** A long-layout CSV: `time` (YYYY-MM) then one column per series, fixed decimals. */
function csv(s: DemoScenario, names: string[], columns: ArrayLike<number>[], decimals: number): string {
  const lines = [['time', ...names].join(',')];
  for (let i = 0; i < s.months; i++) {
    const year = DEMO_YEARS.from + Math.floor(i / 12);
    const month = String((i % 12) + 1).padStart(2, '0');
    lines.push([`${year}-${month}`, ...columns.map((c) => c[i].toFixed(decimals))].join(','));
  }
  return `${lines.join('\n')}\n`;
}
