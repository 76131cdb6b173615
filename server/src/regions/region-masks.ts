import { BadRequestException } from '@nestjs/common';
import { boxMask, polygonMask, STANDARD_BOXES, type PolygonGeometry } from '@upwell/common';
import type { RegionSetVersion } from './region-set.entity';
import type { CellRegion } from './native-grid/native-region-integrals';
import type { NativeHorizontalGrid } from './native-grid/native-horizontal-grid';

/**
 * The cells of each region of a region-set version on a field's grid: a mask must be on a grid of
 * the same dimensions' shape; polygons and boxes are placed by cell centre. A region with no cell
 * on this grid is refused by name (400), since its budget would read as zero.
 */
export function regionMasksOnGrid(version: RegionSetVersion, setName: string, grid: NativeHorizontalGrid): CellRegion[] {
  const cells = grid.shape[0] * grid.shape[1];
  let regions: CellRegion[];
  if (version.kind === 'mask') {
    const shape = version.grid?.shape ?? [];
    if (shape.length !== 2 || shape[0] !== grid.shape[0] || shape[1] !== grid.shape[1] || !version.codes) {
      throw new BadRequestException(`region set "${setName}" v${version.number} is a mask on a ${shape.join(' × ')} grid (${version.grid?.dims.join(', ')}); the budget terms are on ${grid.shape.join(' × ')} (${grid.dims.join(', ')}): upload a mask on the terms' grid`);
    }
    const codes = new Float64Array(version.codes.buffer.slice(version.codes.byteOffset, version.codes.byteOffset + version.codes.byteLength));
    regions = version.regions.map((r) => ({ name: r.name, mask: Uint8Array.from(codes, (c) => (c === r.code ? 1 : 0)) }));
  } else if (version.kind === 'geojson') {
    const features = (version.definition as { features: { properties: { name: string }; geometry: PolygonGeometry }[] }).features;
    regions = features.map((f) => ({ name: f.properties.name, mask: polygonMask(grid.lat, grid.lon, f.geometry) }));
  } else {
    const ids = (version.definition as { boxIds: string[] }).boxIds;
    regions = ids.map((id) => {
      const box = STANDARD_BOXES.find((b) => b.id === id)!;
      return { name: box.name, mask: boxMask(grid.lat, grid.lon, box) };
    });
  }
  const empty = regions.filter((r) => !r.mask.some((m, c) => m === 1 && c < cells && grid.areas[c] > 0));
  if (empty.length > 0) throw new BadRequestException(`region ${empty.map((r) => `"${r.name}"`).join(', ')} of region set "${setName}" holds no ocean cell of this grid`);
  return regions;
}
