import { formatMonth, parseMonth, SERIES_LIMITS, type SeriesDetail, type SeriesSummary, type SeriesVersionView } from '@upwell/common';
import { presentUser } from '../users/user.presenter';
import type { Series, SeriesVersion } from './series.entity';

/** Every n-th value, at most `points` of them, for a sparkline (a missing month stays null). */
export function downsample(values: ReadonlyArray<number | null>, points: number = SERIES_LIMITS.sparklinePoints): (number | null)[] {
  if (values.length <= points) return values.slice();
  const out: (number | null)[] = [];
  const step = values.length / points;
  for (let i = 0; i < points; i++) {
    // Mean of each bucket, so a sparkline shows the shape rather than aliasing monthly noise.
    let sum = 0;
    let n = 0;
    for (let j = Math.floor(i * step); j < Math.floor((i + 1) * step); j++) {
      const v = values[j];
      if (v !== null) (sum += v), n++;
    }
    out.push(n ? sum / n : null);
  }
  return out;
}

/** A version's description, without its values. */
export function presentVersion(v: SeriesVersion): SeriesVersionView {
  return {
    number: v.number,
    start: v.start,
    end: formatMonth(parseMonth(v.start) + v.length - 1),
    length: v.length,
    missing: v.missing,
    valuesSha256: v.valuesSha256,
    file: v.file ? { name: v.file.originalName, sha256: v.file.sha256, size: Number(v.file.size) } : null,
    transform: v.transform,
    createdBy: presentUser(v.createdBy),
    createdAt: v.createdAt.toISOString(),
    note: v.note,
    calendar: v.calendar,
  };
}

/** A series for the library table. */
export function presentSeriesSummary(s: Series, latest: SeriesVersion | null, sparkline: (number | null)[]): SeriesSummary {
  return {
    id: s.id,
    groupId: s.group.id,
    name: s.name,
    kind: s.kind,
    variable: s.variable,
    units: s.units,
    region: s.region,
    depthLayer: s.depthLayer,
    source: s.source,
    origin: s.origin,
    notes: s.notes,
    latest: latest ? { number: latest.number, start: latest.start, end: formatMonth(parseMonth(latest.start) + latest.length - 1), createdAt: latest.createdAt.toISOString() } : null,
    sparkline,
    updatedAt: s.updatedAt.toISOString(),
  };
}

/** A series with all its versions, for its own page. */
export function presentSeriesDetail(s: Series, versions: SeriesVersion[], sparkline: (number | null)[]): SeriesDetail {
  const latest = versions.find((v) => v.number === s.latestVersion) ?? null;
  return {
    ...presentSeriesSummary(s, latest, sparkline),
    versions: versions.map(presentVersion),
    createdBy: presentUser(s.createdBy),
    createdAt: s.createdAt.toISOString(),
  };
}
