import type { DataOrigin, DepthLayer, SeriesKind } from '@upwell/common';
import { join } from 'node:path';
import { writeDemoFiles } from '@upwell/demo-generator';

/** One column of a demo file, described as the import mapping wants it. */
export interface DemoColumn {
  column: string;
  name: string;
  kind: SeriesKind;
  variable: string;
  units: string;
  region: string;
  depthLayer: DepthLayer | null;
  source: string;
  origin: DataOrigin;
  description: string;
}

/** One demo file to upload: its series columns, or its gridded variable and the zonal mean to make of it. */
export interface DemoUpload {
  fileName: string;
  path: string;
  format: 'csv' | 'netcdf';
  columns: DemoColumn[];
  grids: { variable: string; name: string }[];
  zonalMean: { name: string; lat: [number, number]; lon: [number, number] } | null;
}

/** Writes one release of the demo model run into `dir` and groups its manifest by file, in upload order. */
export async function demoRelease(dir: string, release: 1 | 2): Promise<DemoUpload[]> {
  const manifest = await writeDemoFiles(dir, { release });
  const uploads: DemoUpload[] = [];
  for (const { file } of manifest.files) {
    const columns = manifest.series
      .filter((s) => s.file === file)
      .map((s) => ({ column: s.column, name: s.name, kind: s.kind, variable: s.variable, units: s.units, region: s.region, depthLayer: s.depthLayer, source: s.source, origin: s.origin, description: s.description }));
    const fields = manifest.fields.filter((f) => f.file === file);
    if (!columns.length && !fields.length) continue;
    uploads.push({
      fileName: file,
      path: join(dir, file),
      format: file.endsWith('.nc') ? 'netcdf' : 'csv',
      columns,
      grids: fields.map((f) => ({ variable: f.variable, name: f.longName })),
      zonalMean: fields[0] ? { name: fields[0].zonalMeanName, lat: fields[0].lat, lon: fields[0].lon } : null,
    });
  }
  return uploads;
}
