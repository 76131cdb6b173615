import { EntityManager } from '@mikro-orm/sqlite';
import { BadRequestException, Injectable, NotFoundException, UnprocessableEntityException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { AnalysisInputError, computeMap, MAP_LIMITS, type MapEvent, type MapRequestBody, type MapResponse, type MonthlySeries } from '@upwell/common';
import { join } from 'node:path';
import { APP_CONFIG, type AppConfig } from '../../config/app-config';
import { EventSet } from '../../event-sets/event-set.entity';
import { GroupMembership } from '../../groups/group.entity';
import { NotebookPolicy } from '../../notebooks/notebook.policy';
import { NetcdfImportError, openNetcdf, type NetcdfFile } from '../../series/netcdf';
import { SeriesService } from '../../series/series.service';
import type { User } from '../../users/user.entity';
import { GriddedField } from '../field.entity';
import { fieldMapSource } from './field-map-source';
import { presentMap } from './map.presenter';

/** Maps of kept gridded fields: the engine's computeMap fed slice by slice from the field's file. */
@Injectable()
export class FieldMapsService {
  private readonly dataDir: string;

  constructor(
    private readonly em: EntityManager,
    private readonly series: SeriesService,
    private readonly notebooks: NotebookPolicy,
    config: ConfigService,
  ) {
    this.dataDir = config.getOrThrow<AppConfig>(APP_CONFIG).dataDir;
  }

  /** A map of the field; a member of the field's group may make one (an event set needs a role on its notebook). */
  async map(user: User, fieldId: string, body: MapRequestBody): Promise<MapResponse> {
    const field = await this.em.findOne(GriddedField, { id: fieldId }, { populate: ['group', 'file'] });
    if (!field || !(await this.em.count(GroupMembership, { group: field.group, user }))) throw new NotFoundException('no such gridded field');
    const index = body.index ? await this.index(user, body.index) : undefined;
    const events = body.eventSetId ? await this.events(user, body.eventSetId, field.group.id) : undefined;
    let file: NetcdfFile | null = null;
    try {
      file = await openNetcdf(join(this.dataDir, field.file.storedPath));
      const read = fieldMapSource(file, field.variable, body.region);
      const surrogates = body.significance === 'phase-randomised' ? (body.surrogates ?? MAP_LIMITS.surrogatesDefault) : 0;
      if (surrogates * read.source.cells > MAP_LIMITS.maxSurrogateCells) {
        throw new BadRequestException(`phase-randomised p over ${read.source.cells} cells with ${surrogates} surrogates needs more than ${MAP_LIMITS.maxSurrogateCells} running sums: choose a smaller region, fewer surrogates, or the t test`);
      }
      const result = computeMap(read.source, { ...body, index: index?.series, events, surrogates: surrogates || undefined });
      result.warnings.push(...read.notes);
      return presentMap(read, result, body, field.units || read.units || '', index?.units ?? null);
    } catch (err) {
      if (err instanceof AnalysisInputError) throw new BadRequestException(err.message);
      if (err instanceof NetcdfImportError) throw err.where === 'region' ? new BadRequestException(err.message) : new UnprocessableEntityException(err.message);
      throw err;
    } finally {
      await file?.close();
    }
  }

  /** The index series: a stored version the person may view, or the values given. */
  private async index(user: User, ref: NonNullable<MapRequestBody['index']>): Promise<{ series: MonthlySeries; units: string | null }> {
    if ('start' in ref) return { series: { start: ref.start, values: ref.values }, units: null };
    const v = await this.series.values(user, ref.seriesId, ref.version ?? 'latest');
    return { series: { start: v.start, values: v.values }, units: v.units };
  }

  /** The events of a saved set the person may read, from a notebook of the field's group. */
  private async events(user: User, eventSetId: string, groupId: string): Promise<MapEvent[]> {
    const set = await this.em.findOne(EventSet, { id: eventSetId }, { populate: ['notebook', 'notebook.group'] });
    if (!set) throw new NotFoundException('no such event set');
    await this.notebooks.authorize(user, set.notebook.id, 'read');
    if (set.notebook.group.id !== groupId) throw new BadRequestException('eventSetId: that event set belongs to a notebook of another group than the field');
    return set.events.map((e) => ({ phase: e.phase, start: e.start, peak: e.peak, end: e.end }));
  }
}
