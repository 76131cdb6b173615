/**
 * Time–latitude (Hovmöller) recipe: a stored zonal mean, raw or as anomalies of each latitude
 * against its own base-period monthly-mean climatology (engine `anomaly`, WMO-No. 1203 rule).
 *
 * data: HovmollerData (common/src/figure-kinds/hovmoller) — `latitudes` (south to north), `cells` [{ month, lat, value }], time-major.
 *
 * numbers:
 * - `max.value`, `min.value` — largest / smallest value shown, field units
 * - `max.lat`, `min.lat` — their latitude, degrees north
 */
import { anomaly, formatMonth, hovmollerMethods, parseMonth } from '@upwell/common';
import type { FigureRecipeHandler } from './recipe';

/** The Hovmöller recipe. */
export const hovmollerRecipe: FigureRecipeHandler<'hovmoller'> = {
  kind: 'hovmoller',
  bindings: () => [],
  compute(r, inputs) {
    const f = inputs.zonalField;
    // The service loads the field for every hovmoller recipe; its absence here would be a bug.
    if (!f) throw new Error('zonal field was not loaded');
    const nLat = f.latitudes.length;
    const warnings = new Set<string>();
    const columns = f.latitudes.map((lat, j) => {
      const raw = f.rows.map((row) => row[j]);
      if (r.show === 'raw') return raw;
      const a = anomaly({ series: { start: f.start, values: raw }, base: r.base });
      // Latitudes share the field's months, so their warnings mostly repeat: each is said once.
      for (const w of a.warnings) warnings.add(`${f.used.name}: ${w}`);
      return a.anomaly.values;
    });
    const first = parseMonth(f.start);
    const cells: { month: string; lat: number; value: number | null }[] = [];
    let max: { value: number; lat: number } | null = null;
    let min: { value: number; lat: number } | null = null;
    for (let m = 0; m < f.rows.length; m++) {
      const month = formatMonth(first + m);
      for (let j = 0; j < nLat; j++) {
        const value = columns[j][m];
        cells.push({ month, lat: f.latitudes[j], value });
        if (value === null) continue;
        if (max === null || value > max.value) max = { value, lat: f.latitudes[j] };
        if (min === null || value < min.value) min = { value, lat: f.latitudes[j] };
      }
    }
    return {
      data: { units: f.used.units, show: r.show, latitudes: f.latitudes, cells },
      numbers: [
        { key: 'max.value', label: `Largest ${r.show === 'anomaly' ? 'anomaly' : 'value'} of ${f.used.name}`, value: max?.value ?? null, units: f.used.units },
        { key: 'max.lat', label: 'Latitude of the largest value', value: max?.lat ?? null, units: 'degrees_north' },
        { key: 'min.value', label: `Smallest ${r.show === 'anomaly' ? 'anomaly' : 'value'} of ${f.used.name}`, value: min?.value ?? null, units: f.used.units },
        { key: 'min.lat', label: 'Latitude of the smallest value', value: min?.lat ?? null, units: 'degrees_north' },
      ],
      methods: hovmollerMethods(r, f.used),
      cautions: [],
      warnings: [...warnings],
    };
  },
};
