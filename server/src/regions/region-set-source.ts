import { BadRequestException } from '@nestjs/common';
import { regionsFromFlags, STANDARD_BOXES, type RegionSetSource } from '@upwell/common';
import { numberListAttribute, stringAttribute } from '../series/netcdf/attributes';
import { createCfDecoder, decodedCopy } from '../series/netcdf/cf-decoder';
import type { NetcdfFile } from '../series/netcdf/types';
import type { RegionSetKind, StoredRegion } from './region-set.entity';

/** What a new region-set version stores, read from its source. */
export interface ReadRegionSource {
  kind: RegionSetKind;
  regions: StoredRegion[];
  definition: Record<string, unknown>;
  grid: { dims: string[]; shape: number[] } | null;
  codes: Buffer | null;
}

/**
 * Reads a region-set source: a mask variable's codes and CF flags (the open file is passed in for
 * masks), a GeoJSON collection's names, or the chosen standard boxes. Bad input is a 400 saying
 * what to change: a mask without flags, not 2-D, with an empty region; duplicate region names.
 */
export function readRegionSource(source: RegionSetSource, file: NetcdfFile | null): ReadRegionSource {
  if (source.kind === 'standard-boxes') {
    const ids = [...new Set(source.boxIds)];
    const regions = ids.map((id) => ({ name: STANDARD_BOXES.find((b) => b.id === id)!.name, code: null, cells: null }));
    return { kind: 'standard-boxes', regions, definition: { boxIds: ids }, grid: null, codes: null };
  }
  if (source.kind === 'geojson') {
    const names = source.geojson.features.map((f) => f.properties.name);
    const twice = names.find((n, i) => names.indexOf(n) !== i);
    if (twice) throw new BadRequestException(`geojson: two features are named "${twice}"; region names must be unique`);
    return { kind: 'geojson', regions: names.map((name) => ({ name, code: null, cells: null })), definition: source.geojson as unknown as Record<string, unknown>, grid: null, codes: null };
  }
  const v = file!.variable(source.variable);
  if (v.dims.length !== 2) throw new BadRequestException(`${v.name} has dimensions (${v.dims.join(', ')}); a region mask is one 2-D variable on the model's horizontal grid`);
  const values = numberListAttribute(v.attributes, 'flag_values');
  const meanings = stringAttribute(v.attributes, 'flag_meanings');
  if (!values || !meanings) throw new BadRequestException(`${v.name} has no flag_values / flag_meanings (CF 1.11 §3.5); add them to name the region of each integer code`);
  const codes = decodedCopy(file!.read(v.name), createCfDecoder(v)).values;
  let found;
  try {
    found = regionsFromFlags(codes, values, meanings);
  } catch (e) {
    throw new BadRequestException(`${v.name}: ${(e as Error).message}`);
  }
  return {
    kind: 'mask',
    regions: found.map((r) => ({ name: r.name, code: r.code, cells: r.cells })),
    definition: { uploadId: source.uploadId, variable: v.name },
    grid: { dims: v.dims, shape: v.shape },
    codes: Buffer.from(codes.buffer, codes.byteOffset, codes.byteLength),
  };
}
