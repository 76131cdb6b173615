import type { MapRequestBody, MapResponse, MapResult } from '@upwell/common';
import type { FieldMapSource } from './field-map-source';

/** The JSON answer of a map: NaN → null, flags → booleans, units by mode. */
export function presentMap(read: FieldMapSource, result: MapResult, body: MapRequestBody, fieldUnits: string, indexUnits: string | null): MapResponse {
  const nullable = (a: Float64Array) => Array.from(a, (v) => (Number.isFinite(v) ? v : null));
  const units =
    body.mode === 'correlation' ? '1' : body.mode === 'regression' ? `${fieldUnits || '1'} per ${indexUnits ? `(${indexUnits})` : 'index unit'}` : fieldUnits;
  return {
    lat: read.lat,
    lon: read.lon,
    values: nullable(result.values),
    ...(result.p ? { p: nullable(result.p) } : {}),
    ...(result.significant ? { significant: Array.from(result.significant, (v) => v === 1) } : {}),
    units,
    counts: result.counts,
    warnings: result.warnings,
  };
}
