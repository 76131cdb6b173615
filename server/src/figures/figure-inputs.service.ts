import { EntityManager } from '@mikro-orm/sqlite';
import { Injectable, NotFoundException } from '@nestjs/common';
import { EventSet } from '../event-sets/event-set.entity';
import { ZonalMeanField } from '../fields/field.entity';
import { Series, SeriesVersion } from '../series/series.entity';
import { decodeValues, valuesSha256 } from '../series/values-codec';
import { contentSha256 } from './cache-key';
import type { LoadedEventSet, LoadedSeries, LoadedZonalField, NamedBinding } from './loaded-inputs';

/** A binding resolved to a stored version whose values are not loaded yet. */
export interface ResolvedBinding {
  path: string;
  series: Series;
  number: number;
  valuesSha256: string;
}

/** Most (series, version) hashes remembered; versions are immutable, so this only bounds memory. */
const VERSION_MEMO_MAX = 50_000;

/** An event set with the hash of its events, for the cache key. */
export interface ResolvedEventSet extends LoadedEventSet {
  eventsSha256: string;
}

/**
 * Finds what a figure is computed from, within the notebook's group and the notebook itself:
 * first the version rows (cheap; enough for the cache key), values only when computing.
 */
@Injectable()
export class FigureInputsService {
  // A version's values never change, so its hash can be remembered: a cached figure then costs
  // the notebook check and one series query, not a version query too.
  private readonly versionSha = new Map<string, string>();

  constructor(private readonly em: EntityManager) {}

  /**
   * Resolves each binding to a version of a series of the group: "latest" to the series'
   * latestVersion. A series of another group, one that does not exist, one without values, or a
   * pinned version that does not exist is a 404 naming the binding's path.
   */
  async resolve(groupId: string, bindings: NamedBinding[]): Promise<ResolvedBinding[]> {
    if (bindings.length === 0) return [];
    const ids = [...new Set(bindings.map((b) => b.seriesId))];
    const found = await this.em.find(Series, { id: { $in: ids }, group: groupId });
    const byId = new Map(found.map((s) => [s.id, s]));
    const wanted = bindings.map((b) => {
      const series = byId.get(b.seriesId);
      if (!series) throw new NotFoundException(`${b.path}: there is no series ${b.seriesId} in this notebook's group`);
      if (series.latestVersion === 0) throw new NotFoundException(`${b.path}: series "${series.name}" has no values yet`);
      const number = b.version === 'latest' ? series.latestVersion : b.version;
      return { b, series, number };
    });
    const unknown = wanted.filter((w) => !this.versionSha.has(`${w.series.id}@${w.number}`));
    if (unknown.length) {
      const versions = await this.em.find(SeriesVersion, { $or: unknown.map((w) => ({ series: w.series.id, number: w.number })) }, { fields: ['series', 'number', 'valuesSha256'] });
      if (this.versionSha.size > VERSION_MEMO_MAX) this.versionSha.clear();
      for (const v of versions) this.versionSha.set(`${v.series.id}@${v.number}`, v.valuesSha256);
    }
    return wanted.map(({ b, series, number }) => {
      const sha = this.versionSha.get(`${series.id}@${number}`);
      if (sha === undefined) {
        throw new NotFoundException(`${b.path}: series "${series.name}" has versions 1 to ${series.latestVersion}; there is no version ${number}`);
      }
      return { path: b.path, series, number, valuesSha256: sha };
    });
  }

  /** Loads and decodes the values of resolved bindings, by path. */
  async load(resolved: ResolvedBinding[]): Promise<Map<string, LoadedSeries>> {
    if (resolved.length === 0) return new Map();
    const versions = await this.em.find(SeriesVersion, { $or: resolved.map((r) => ({ series: r.series.id, number: r.number })) }, { populate: ['values'] });
    const decoded = new Map(versions.map((v) => [`${v.series.id}@${v.number}`, { start: v.start, values: decodeValues(v.values) }]));
    return new Map(
      resolved.map((r) => {
        const v = decoded.get(`${r.series.id}@${r.number}`);
        // Versions are never deleted on their own; a series deleted since resolve() is gone for good.
        if (!v) throw new NotFoundException(`${r.path}: series "${r.series.name}" was deleted`);
        const loaded: LoadedSeries = {
          seriesId: r.series.id,
          name: r.series.name,
          version: r.number,
          units: r.series.units,
          origin: r.series.origin,
          valuesSha256: r.valuesSha256,
          start: v.start,
          values: v.values,
        };
        return [r.path, loaded];
      }),
    );
  }

  /** A saved event set of this notebook; 404 when it is of another notebook or does not exist. */
  async eventSet(notebookId: string, eventSetId: string): Promise<ResolvedEventSet> {
    const set = await this.em.findOne(EventSet, { id: eventSetId, notebook: notebookId });
    if (!set) throw new NotFoundException(`events.eventSetId: there is no event set ${eventSetId} in this notebook`);
    return {
      id: set.id,
      name: set.name,
      updatedAt: set.updatedAt.toISOString(),
      events: set.events,
      eventsSha256: contentSha256(set.events),
    };
  }

  /** A stored zonal mean of the group, without its values; 404 otherwise. */
  async zonalField(groupId: string, fieldId: string): Promise<ZonalMeanField> {
    const field = await this.em.findOne(ZonalMeanField, { id: fieldId, group: groupId });
    if (!field) throw new NotFoundException(`zonalFieldId: there is no zonal-mean field ${fieldId} in this notebook's group`);
    return field;
  }

  /** The field's values as time-major rows. Fields are immutable, so their "version" is always 1. */
  async loadZonalField(field: ZonalMeanField): Promise<LoadedZonalField> {
    await this.em.populate(field, ['values']);
    const n = field.latitudes.length;
    const rows = Array.from({ length: field.months }, (_, m) =>
      Array.from({ length: n }, (_, j) => {
        const v = field.values.readDoubleLE((m * n + j) * 8);
        return Number.isNaN(v) ? null : v;
      }),
    );
    return {
      used: { seriesId: field.id, name: field.name, version: 1, units: field.units, origin: 'derived', valuesSha256: valuesSha256(field.values) },
      start: field.start,
      latitudes: field.latitudes,
      rows,
    };
  }
}
