/** The maps engine's reference fixture (scripts/maps_reference.py) and a slice source built from it. */
import type { MapFieldSource } from '../src/maps/map-types';
import { regionColumns } from '../src/maps/region-columns';
import { regionRows } from '../src/maps/region-rows';
import { parseMonth } from '../src/series/month';
import { fixtureText } from './read-fixture';

/** One expected map of the fixture. */
export interface MapsReferenceCase {
  name: string;
  request: Record<string, unknown> & { region?: { lat: [number, number]; lon: [number, number] } };
  lat: number[];
  lon: number[];
  values: (number | null)[];
  p?: (number | null)[];
  nEff?: (number | null)[];
  n?: (number | null)[];
  fdr?: { significant: boolean[]; adjusted: (number | null)[]; pointwise: number; fdr: number; tested: number };
  eventMonths?: number;
  neutralMonths?: number;
  lonConvention: 180 | 360;
}

/** The parsed fixture. */
export interface MapsReference {
  field: { start: string; lat: number[]; lon: number[]; values: (number | null)[] };
  index: { start: string; values: (number | null)[] };
  events: { phase: 'warm' | 'cold'; start: string; peak: string; end: string }[];
  cases: MapsReferenceCase[];
  fdrDemo: { p: (number | null)[]; alpha: number; significant: boolean[]; adjusted: (number | null)[]; pointwise: number; fdr: number; tested: number };
  welch: { a: number[]; b: number[]; t: number; p: number; oneSampleMu: number; oneSampleT: number; oneSampleP: number };
  pattern: { a: string; b: string; weights: number[]; correlation: number; rmsDifference: number; centredRmsDifference: number; cells: number };
}

/** Reads common/test-fixtures/maps-reference.json. */
export function mapsReference(): MapsReference {
  return JSON.parse(fixtureText('maps-reference.json')) as MapsReference;
}

/**
 * The fixture's field as a MapFieldSource over a region, in the −180…180 (as stored) or 0…360
 * longitude convention, read slice by slice like the server reads a file. Also the region's
 * latitudes and longitudes in output order.
 */
export function referenceSource(ref: MapsReference, convention: 180 | 360, region?: { lat: [number, number]; lon: [number, number] }): { source: MapFieldSource; lat: number[]; lon: number[] } {
  const { lat, lon, values } = ref.field;
  const nlon = lon.length;
  // The 0…360 grid is the same cells with columns reordered to increasing 0…360 longitude.
  const order = Array.from({ length: nlon }, (_, i) => i);
  if (convention === 360) order.sort((a, b) => (((lon[a] % 360) + 360) % 360) - (((lon[b] % 360) + 360) % 360));
  const lonStored = order.map((i) => (convention === 360 ? ((lon[i] % 360) + 360) % 360 : lon[i]));
  const rows = regionRows(lat, region?.lat);
  const cols = regionColumns(lonStored, region?.lon);
  const first = parseMonth(ref.field.start);
  const months = values.length / (lat.length * nlon);
  const cells = rows.count * cols.index.length;
  const source: MapFieldSource = {
    first,
    last: first + months - 1,
    cells,
    read(month, out) {
      const t = month - first;
      if (t < 0 || t >= months) return false;
      for (let r = 0; r < rows.count; r++) {
        for (let k = 0; k < cols.index.length; k++) {
          const v = values[(t * lat.length + rows.start + r) * nlon + order[cols.index[k]]];
          out[r * cols.index.length + k] = v === null ? NaN : v;
        }
      }
      return true;
    },
  };
  return { source, lat: Array.from(rows.lat), lon: Array.from(cols.lon) };
}
