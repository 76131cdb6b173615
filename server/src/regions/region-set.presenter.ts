import type { RegionSetView, RegionSetVersionView } from '@upwell/common';
import type { RegionSet, RegionSetVersion } from './region-set.entity';

/** The answer shape of one version. */
export function presentRegionSetVersion(v: RegionSetVersion): RegionSetVersionView {
  return {
    number: v.number,
    kind: v.kind,
    regions: v.regions.map((r) => ({ name: r.name, code: r.code, cells: r.cells })),
    grid: v.grid ? { dims: v.grid.dims, shape: v.grid.shape, file: v.file?.originalName ?? '' } : null,
    createdAt: v.createdAt.toISOString(),
  };
}

/** The answer shape of a region set with its versions, oldest first. */
export function presentRegionSet(set: RegionSet, versions: RegionSetVersion[]): RegionSetView {
  return { id: set.id, groupId: set.group.id, name: set.name, versions: [...versions].sort((a, b) => a.number - b.number).map(presentRegionSetVersion) };
}
