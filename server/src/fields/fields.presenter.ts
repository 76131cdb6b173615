import { isPresent, type GriddedFieldView, type ZonalMeanFieldView } from '@upwell/common';
import type { GriddedField, ZonalMeanField } from './field.entity';

/** A kept gridded variable. */
export function presentGriddedField(f: GriddedField): GriddedFieldView {
  return {
    id: f.id,
    groupId: f.group.id,
    variable: f.variable,
    longName: f.longName,
    units: f.units,
    dims: f.dims,
    shape: f.shape,
    start: f.start,
    extent: f.extent,
    fileName: f.file.originalName,
    createdAt: f.createdAt.toISOString(),
  };
}

/** A stored zonal mean; its values only when asked for one field. */
export function presentZonalField(f: ZonalMeanField, withValues = false): ZonalMeanFieldView {
  const view: ZonalMeanFieldView = {
    id: f.id,
    groupId: f.group.id,
    name: f.name,
    start: f.start,
    months: f.months,
    latitudes: f.latitudes,
    units: f.units,
    provenance: f.provenance,
    createdAt: f.createdAt.toISOString(),
  };
  if (withValues) {
    const n = f.latitudes.length;
    view.values = Array.from({ length: f.months }, (_, m) =>
      Array.from({ length: n }, (_, j) => {
        const v = f.values.readDoubleLE((m * n + j) * 8);
        return isPresent(v) ? v : null;
      }),
    );
  }
  return view;
}
