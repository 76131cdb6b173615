import { EntityManager } from '@mikro-orm/sqlite';
import { Injectable, NotFoundException } from '@nestjs/common';
import {
  formatMonth,
  isPresent,
  normalizeCalendar,
  parseMonth,
  type ListSeriesQuery,
  type SeriesDetail,
  type SeriesMetadata,
  type SeriesPage,
  type SeriesTransform,
  type SeriesValues,
  type UpdateSeriesRequest,
  type VersionRef,
} from '@upwell/common';
import { GroupPolicy } from '../groups/group.policy';
import type { Group } from '../groups/group.entity';
import { RealtimeEvents } from '../realtime/realtime-events';
import type { UploadedFile } from '../uploads/uploaded-file.entity';
import type { User } from '../users/user.entity';
import { Series, SeriesVersion } from './series.entity';
import { SeriesPolicy } from './series.policy';
import { downsample, presentSeriesDetail, presentSeriesSummary } from './series.presenter';
import { decodeValues, encodeValues, valuesSha256 } from './values-codec';

/** Values for a new version, and where they came from. */
export interface NewVersion {
  start: string;
  values: ReadonlyArray<number | null>;
  file: UploadedFile | null;
  transform: SeriesTransform | null;
  note?: string;
  /** CF calendar of the source (NetCDF time axis, CSV import option); default standard. */
  calendar?: string;
}

/** What adding a version did. */
export interface AddedVersion {
  series: Series;
  version: SeriesVersion;
  /** False when the values were identical to the latest version's, so no version was added. */
  created: boolean;
}

/** The group's series library: series, their versions and their values. */
@Injectable()
export class SeriesService {
  constructor(
    private readonly em: EntityManager,
    private readonly groups: GroupPolicy,
    private readonly policy: SeriesPolicy,
    private readonly events: RealtimeEvents,
  ) {}

  async list(user: User, groupId: string, q: ListSeriesQuery): Promise<SeriesPage> {
    await this.groups.authorize(user, groupId, 'view');
    const all = await this.em.find(Series, { group: groupId }, { populate: ['group'] });
    const needle = q.q?.toLocaleLowerCase();
    // A group keeps hundreds of series, not millions: filtering and sorting here keeps the rules in one readable place.
    const matching = all.filter(
      (s) =>
        (!q.kind || s.kind === q.kind) &&
        (!needle || [s.name, s.variable, s.region, s.source, s.units].some((f) => f.toLocaleLowerCase().includes(needle))),
    );
    const key = (s: Series) => (q.sort === 'updated' ? s.updatedAt.toISOString() : q.sort === 'kind' ? `${s.kind}\u0000${s.name}` : s.name.toLocaleLowerCase());
    matching.sort((a, b) => (key(a) < key(b) ? -1 : key(a) > key(b) ? 1 : 0) * (q.order === 'desc' ? -1 : 1));
    const items = matching.slice((q.page - 1) * q.pageSize, q.page * q.pageSize);
    const latest = await this.latestVersions(items, true);
    return {
      items: items.map((s) => {
        const v = latest.get(s.id) ?? null;
        return presentSeriesSummary(s, v, v ? downsample(decodeValues(v.values)) : []);
      }),
      total: matching.length,
      page: q.page,
      pageSize: q.pageSize,
    };
  }

  async detail(user: User, seriesId: string): Promise<SeriesDetail> {
    const series = await this.policy.authorize(user, seriesId, 'view');
    return this.present(series);
  }

  async update(user: User, seriesId: string, body: UpdateSeriesRequest): Promise<SeriesDetail> {
    const series = await this.policy.authorize(user, seriesId, 'upload-series');
    Object.assign(series, body, { updatedAt: new Date() });
    await this.em.flush();
    return this.present(series);
  }

  async remove(user: User, seriesId: string): Promise<void> {
    const series = await this.policy.authorize(user, seriesId, 'delete-series');
    const groupId = series.group.id;
    await this.em.transactional(async (em) => {
      await em.nativeDelete(SeriesVersion, { series: seriesId });
      await em.nativeDelete(Series, { id: seriesId });
    });
    this.events.seriesDeleted(groupId, seriesId);
  }

  /** The values of one version ("latest" or a number) as a monthly series. */
  async values(user: User, seriesId: string, ref: VersionRef): Promise<SeriesValues> {
    const series = await this.policy.authorize(user, seriesId, 'view');
    const number = ref === 'latest' ? series.latestVersion : ref;
    const version = await this.em.findOne(SeriesVersion, { series, number }, { populate: ['values'] });
    if (!version) {
      throw new NotFoundException(
        series.latestVersion ? `this series has versions 1 to ${series.latestVersion}; there is no version ${number}` : 'this series has no values yet',
      );
    }
    return { seriesId, version: version.number, start: version.start, values: decodeValues(version.values), units: series.units };
  }

  /** One version as CSV: a month column and a value column, empty for a missing month. */
  async csv(user: User, seriesId: string, ref: VersionRef): Promise<{ fileName: string; body: string }> {
    const v = await this.values(user, seriesId, ref);
    const series = await this.em.findOneOrFail(Series, { id: seriesId });
    const first = parseMonth(v.start);
    const lines = ['month,value', ...v.values.map((x, i) => `${formatMonth(first + i)},${x === null ? '' : String(x)}`)];
    const slug = series.name.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'series';
    return { fileName: `${slug}-v${v.version}.csv`, body: lines.join('\n') + '\n' };
  }

  /**
   * Creates a series with its first version, inside the caller's transaction.
   * The caller tells the group once its transaction has committed.
   */
  createSeries(em: EntityManager, group: Group, user: User, meta: SeriesMetadata, first: NewVersion): AddedVersion {
    const series = em.create(Series, { ...meta, group, createdBy: user });
    return this.addVersion(em, series, user, first, null);
  }

  /**
   * Adds a version to a series unless its values equal the latest version's
   * (re-uploading the same file should not make a new version).
   */
  addVersion(em: EntityManager, series: Series, user: User, next: NewVersion, latest: SeriesVersion | null): AddedVersion {
    const encoded = encodeValues(next.values);
    const sha = valuesSha256(encoded);
    const calendar = normalizeCalendar(next.calendar);
    if (latest && latest.valuesSha256 === sha && latest.start === next.start && latest.calendar === calendar) return { series, version: latest, created: false };
    series.latestVersion += 1;
    series.updatedAt = new Date();
    const version = em.create(SeriesVersion, {
      series,
      number: series.latestVersion,
      start: next.start,
      length: next.values.length,
      missing: next.values.reduce<number>((n, v) => n + (isPresent(v) ? 0 : 1), 0),
      values: encoded,
      valuesSha256: sha,
      file: next.file,
      transform: next.transform,
      note: next.note ?? '',
      calendar,
      createdBy: user,
    });
    return { series, version, created: true };
  }

  /** Tells everyone in the group about versions that were just committed. */
  announce(added: AddedVersion[], user: User): void {
    for (const a of added) {
      if (a.created) this.events.seriesVersionCreated({ groupId: a.series.group.id, seriesId: a.series.id, name: a.series.name, version: a.version.number, createdBy: user.name });
    }
  }

  /** The latest version of each series, values loaded on request. */
  async latestVersions(series: Series[], withValues = false): Promise<Map<string, SeriesVersion>> {
    const wanted = series.filter((s) => s.latestVersion > 0);
    if (!wanted.length) return new Map();
    const versions = await this.em.find(
      SeriesVersion,
      { $or: wanted.map((s) => ({ series: s.id, number: s.latestVersion })) },
      { populate: withValues ? ['values'] : [] },
    );
    return new Map(versions.map((v) => [v.series.id, v]));
  }

  private async present(series: Series): Promise<SeriesDetail> {
    const versions = await this.em.find(SeriesVersion, { series }, { populate: ['createdBy', 'file'], orderBy: { number: 'desc' } });
    const latest = (await this.latestVersions([series], true)).get(series.id);
    return presentSeriesDetail(series, versions, latest ? downsample(decodeValues(latest.values), 600) : []);
  }
}
