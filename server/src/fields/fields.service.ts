import { EntityManager } from '@mikro-orm/sqlite';
import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { FieldsList, ReduceFieldBody, ReduceFieldResponse, ZonalMeanFieldView } from '@upwell/common';
import { join } from 'node:path';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { GroupPolicy } from '../groups/group.policy';
import { JobRunner } from '../jobs/job-runner';
import { netcdfFailureAs4xx } from '../jobs/netcdf-failure';
import type { NetcdfLimits } from '../series/netcdf';
import { Series } from '../series/series.entity';
import { SeriesService } from '../series/series.service';
import type { User } from '../users/user.entity';
import { GriddedField, ZonalMeanField } from './field.entity';
import { presentGriddedField, presentZonalField } from './fields.presenter';

/** Gridded fields kept from uploads, and the regional and zonal reductions made from them. */
@Injectable()
export class FieldsService {
  private readonly dataDir: string;
  private readonly limits: NetcdfLimits;

  constructor(
    private readonly em: EntityManager,
    private readonly groups: GroupPolicy,
    private readonly series: SeriesService,
    private readonly jobs: JobRunner,
    config: ConfigService,
  ) {
    const app = config.getOrThrow<AppConfig>(APP_CONFIG);
    this.dataDir = app.dataDir;
    this.limits = app.netcdfLimits;
  }

  async list(user: User, groupId: string): Promise<FieldsList> {
    await this.groups.authorize(user, groupId, 'view');
    const gridded = await this.em.find(GriddedField, { group: groupId }, { populate: ['file', 'group'], orderBy: { createdAt: 'desc' } });
    const zonal = await this.em.find(ZonalMeanField, { group: groupId }, { populate: ['group'], orderBy: { createdAt: 'desc' } });
    return { gridded: gridded.map(presentGriddedField), zonal: zonal.map((z) => presentZonalField(z)) };
  }

  async zonal(user: User, id: string): Promise<ZonalMeanFieldView> {
    const field = await this.em.findOne(ZonalMeanField, { id }, { populate: ['group', 'values'] });
    if (!field || !(await this.groups.allows(user, field.group.id, 'view'))) throw new NotFoundException('no such zonal-mean field');
    return presentZonalField(field, true);
  }

  /** Reduces a kept field over a box (→ a series version) or a longitude band (→ a zonal-mean field). */
  async reduce(user: User, fieldId: string, body: ReduceFieldBody): Promise<ReduceFieldResponse> {
    const field = await this.em.findOne(GriddedField, { id: fieldId }, { populate: ['group', 'file'] });
    if (!field || !(await this.groups.allows(user, field.group.id, 'view'))) throw new NotFoundException('no such gridded field');
    await this.groups.authorize(user, field.group.id, 'upload-series');
    const path = join(this.dataDir, field.file.storedPath);
    if (body.kind === 'zonal-mean') {
      const z = await netcdfFailureAs4xx(this.jobs.run('zonal-mean', { path, limits: this.limits, variable: field.variable, options: { lon: body.lon, lat: body.lat, depth: body.depth } }));
      const n = z.lat.length;
      const values = Buffer.alloc(z.values.length * n * 8);
      z.values.forEach((row, m) => row.forEach((v, j) => values.writeDoubleLE(v ?? Number.NaN, (m * n + j) * 8)));
      const stored = this.em.create(ZonalMeanField, {
        group: field.group,
        source: field,
        name: body.name,
        start: z.start,
        months: z.values.length,
        latitudes: z.lat,
        values,
        units: z.units ?? field.units,
        provenance: z.provenance as unknown as Record<string, unknown>,
        createdBy: user,
      });
      await this.em.flush();
      return { series: null, zonal: presentZonalField(stored) };
    }
    const method = body.kind === 'box-integral' ? 'integral' : 'mean';
    const box = { lat: body.lat, lon: body.lon, ...(body.depth ? { depth: body.depth } : {}) };
    const r = await netcdfFailureAs4xx(this.jobs.run('reduce-box', { path, limits: this.limits, variable: field.variable, options: { box, method } }));
    const described = `${r.provenance.method} of ${field.variable} over ${body.lat[0]}…${body.lat[1]}°N, ${body.lon[0]}…${body.lon[1]}°E${body.depth ? `, ${body.depth[0]}–${body.depth[1]} m` : ''} (${r.provenance.radiusConvention})`;
    const version = { start: r.start, values: r.values, file: field.file, calendar: r.calendar, transform: { type: 'grid-reduction' as const, fieldId: field.id, method: r.provenance.method, description: described } };
    const added = await this.em.transactional(async (em) => {
      if (body.seriesId) {
        const target = await em.findOne(Series, { id: body.seriesId, group: field.group }, { populate: ['group'] });
        if (!target) throw new BadRequestException('seriesId: that series is not in this field’s group');
        return this.series.addVersion(em, target, user, version, (await this.series.latestVersions([target])).get(target.id) ?? null);
      }
      return this.series.createSeries(em, field.group, user, { name: body.name, kind: body.seriesKind, variable: field.variable, units: r.units ?? '', region: `${body.lat[0]}…${body.lat[1]}°N, ${body.lon[0]}…${body.lon[1]}°E`, depthLayer: body.depth ? `${body.depth[0]}–${body.depth[1]} m` : '', source: field.file.originalName, origin: 'derived', notes: described }, version);
    });
    this.series.announce([added], user);
    return { series: { id: added.series.id, name: added.series.name, version: added.version.number, created: added.created }, zonal: null };
  }
}
