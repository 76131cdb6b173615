import { EntityManager } from '@mikro-orm/sqlite';
import {
  BadRequestException,
  ConflictException,
  Injectable,
  NotFoundException,
  PayloadTooLargeException,
  UnprocessableEntityException,
  UnsupportedMediaTypeException,
} from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import {
  SERIES_IMPORT_LIMITS,
  type CsvImportOptions,
  type ImportUploadBody,
  type ImportUploadResponse,
  type StagedUploadsList,
  type UploadPreview,
} from '@upwell/common';
import { createReadStream } from 'node:fs';
import { mkdir, rename, rm } from 'node:fs/promises';
import { join } from 'node:path';
import { pipeline } from 'node:stream/promises';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { GroupPolicy } from '../groups/group.policy';
import { RealtimeEvents } from '../realtime/realtime-events';
import { buildSeriesFromMapping, CsvImportError, parseCsvForImport } from '../series/csv';
import { Series, SeriesVersion } from '../series/series.entity';
import { SeriesService, type AddedVersion } from '../series/series.service';
import type { User } from '../users/user.entity';
import type { HashedFile } from './hashing-disk-storage';
import { progressStream } from './progress-stream';
import { cleanFileName, sniffFormat } from './sniff-format';
import { UploadedFile } from './uploaded-file.entity';
import { formatDepthLayer } from './depth-layer';
import { GriddedField } from '../fields/field.entity';
import { JobRunner } from '../jobs/job-runner';
import { UploadQuotas } from './upload-quotas';
import { netcdfFailureAs4xx } from '../jobs/netcdf-failure';

/** A file as Multer and the hashing storage hand it over. */
export type ReceivedFile = HashedFile & { originalname: string };

/**
 * Uploads: a file is received to disk, read into a preview, and kept staged;
 * series are made from it only when the researcher sends back a mapping.
 * A file that cannot be read leaves nothing behind.
 */
@Injectable()
export class UploadsService {
  private readonly config: AppConfig;

  constructor(
    private readonly em: EntityManager,
    private readonly groups: GroupPolicy,
    private readonly series: SeriesService,
    private readonly events: RealtimeEvents,
    private readonly jobs: JobRunner,
    private readonly quotas: UploadQuotas,
    config: ConfigService,
  ) {
    this.config = config.getOrThrow<AppConfig>(APP_CONFIG);
  }

  async stage(user: User, groupId: string, file: ReceivedFile | undefined, options: CsvImportOptions): Promise<UploadPreview> {
    try {
      const membership = await this.groups.authorize(user, groupId, 'upload-series');
      if (!file) throw new BadRequestException('send the file as multipart/form-data in a field named "file"');
      if (file.size === 0) throw new UnprocessableEntityException('the file is empty');
      const format = await sniffFormat(file.path);
      if (!format) throw new UnsupportedMediaTypeException('this is neither a CSV/text table nor a NetCDF file (it is binary and has no NetCDF or HDF5 signature)');
      const upload = this.em.create(UploadedFile, {
        group: membership.group,
        originalName: cleanFileName(file.originalname),
        sha256: file.sha256,
        size: file.size,
        format,
        storedPath: '',
        options: format === 'csv' ? options : null,
        uploadedBy: user,
      });
      upload.storedPath = join('uploads', `${upload.id}.${format === 'csv' ? 'csv' : 'nc'}`);
      const preview = await this.read(upload, file.path, user);
      await mkdir(join(this.config.dataDir, 'uploads'), { recursive: true });
      await rename(file.path, join(this.config.dataDir, upload.storedPath));
      await this.em.flush();
      return preview;
    } finally {
      // Whatever happened, the temporary part file does not stay (it was renamed on success).
      if (file) await rm(file.path, { force: true });
    }
  }

  async import(user: User, uploadId: string, body: ImportUploadBody): Promise<ImportUploadResponse> {
    const upload = await this.em.findOne(UploadedFile, { id: uploadId }, { populate: ['group'] });
    if (!upload) throw new NotFoundException('no such upload; it may have been discarded');
    await this.groups.authorize(user, upload.group.id, 'upload-series');
    const path = join(this.config.dataDir, upload.storedPath);
    this.events.uploadProgress(user.id, { uploadId, phase: 'importing', fraction: null });
    const wanted = await this.seriesFromFile(upload, path, body, user);
    const fields = await this.fieldsFromNetcdf(upload, path, body, user);
    const targets = await this.resolveTargets(upload, body.targets);
    const added: AddedVersion[] = await this.em.transactional(async (em) => {
      const out: AddedVersion[] = [];
      for (const s of wanted) {
        const target = targets.get(s.column);
        const version = { start: s.start, values: s.values, file: upload, transform: s.transform, calendar: s.calendar };
        if (target) out.push(this.series.addVersion(em, target.series, user, version, target.latest));
        else out.push(this.series.createSeries(em, upload.group, user, { ...s.meta, origin: body.origin }, version));
      }
      upload.importedAt = new Date();
      return out;
    });
    this.series.announce(added, user);
    this.events.uploadProgress(user.id, { uploadId, phase: 'done', fraction: 1 });
    return {
      series: added.map((a) => ({ id: a.series.id, name: a.series.name, version: a.version.number, created: a.created })),
      fields: fields.map((f) => ({ id: f.id, name: f.longName || f.variable })),
    };
  }

  /** The group's staged uploads (nothing imported yet), oldest first, and the asking person's quota. */
  async listStaged(user: User, groupId: string): Promise<StagedUploadsList> {
    await this.groups.authorize(user, groupId, 'upload-series');
    const rows = await this.em.find(UploadedFile, { group: groupId, importedAt: null }, { populate: ['uploadedBy'], orderBy: { createdAt: 'asc' } });
    const limits = this.config.uploads;
    return {
      uploads: rows.map((u) => ({
        uploadId: u.id,
        fileName: u.originalName,
        size: u.size,
        format: u.format,
        uploadedBy: { id: u.uploadedBy.id, name: u.uploadedBy.name },
        createdAt: u.createdAt.toISOString(),
        expiresAt: new Date(u.createdAt.getTime() + limits.stagedTtlHours * 3600_000).toISOString(),
      })),
      quota: {
        stagedBytes: await this.quotas.stagedBytes(user.id),
        stagedBytesPerPerson: limits.stagedBytesPerPerson,
        concurrentPerPerson: limits.concurrentPerPerson,
        stagedTtlHours: limits.stagedTtlHours,
        idleTimeoutSeconds: limits.idleTimeoutMs / 1000,
      },
    };
  }

  async discard(user: User, uploadId: string): Promise<void> {
    const upload = await this.em.findOne(UploadedFile, { id: uploadId }, { populate: ['group'] });
    if (!upload) throw new NotFoundException('no such upload');
    await this.groups.authorize(user, upload.group.id, 'upload-series');
    if (upload.importedAt) throw new ConflictException('series were made from this upload; it stays as their provenance');
    await this.em.removeAndFlush(upload);
    await rm(join(this.config.dataDir, upload.storedPath), { force: true });
  }

  /** Reads a staged file into its preview; a file that cannot be read becomes a 4xx naming where. */
  private async read(upload: UploadedFile, path: string, user: User): Promise<UploadPreview> {
    const base = { uploadId: upload.id, fileName: upload.originalName, size: upload.size, sha256: upload.sha256, format: upload.format };
    if (upload.format === 'csv') {
      if (upload.size > SERIES_IMPORT_LIMITS.maxUploadBytes) {
        throw new PayloadTooLargeException(`a CSV table may be at most ${SERIES_IMPORT_LIMITS.maxUploadBytes / 1024 ** 2} MB; this one is ${(upload.size / 1024 ** 2).toFixed(1)} MB`);
      }
      const csv = await this.parseCsv(upload, path, user);
      return { ...base, csv, netcdf: null };
    }
    this.events.uploadProgress(user.id, { uploadId: upload.id, phase: 'parsing', fraction: null });
    const netcdf = await netcdfFailureAs4xx(this.jobs.run('netcdf-preview', { path, limits: this.config.netcdfLimits }));
    return { ...base, csv: null, netcdf };
  }

  private async parseCsv(upload: UploadedFile, path: string, user: User) {
    const report = (fraction: number) => this.events.uploadProgress(user.id, { uploadId: upload.id, phase: 'parsing', fraction });
    const counted = createReadStream(path).pipe(progressStream(upload.size, report));
    try {
      return await parseCsvForImport(counted, { ...(upload.options as CsvImportOptions), fileName: upload.originalName });
    } catch (err) {
      if (err instanceof CsvImportError) {
        throw new UnprocessableEntityException({ statusCode: 422, error: 'Unprocessable Entity', message: err.message, issues: [{ path: err.column ?? '', message: err.message }], line: err.line, column: err.column, code: err.code });
      }
      throw err;
    }
  }

  /** The series the mapping asks for, read from the stored file the same way the preview read it. */
  private async seriesFromFile(upload: UploadedFile, path: string, body: ImportUploadBody, user: User) {
    if (upload.format !== 'csv') return this.seriesFromNetcdf(path, body);
    const preview = await this.parseCsv(upload, path, user);
    try {
      return buildSeriesFromMapping(preview, { columns: body.columns }).map((s) => ({
        column: s.column,
        start: s.start,
        values: s.values,
        calendar: (upload.options as CsvImportOptions | null)?.calendar,
        transform: { type: 'csv-column' as const, column: s.column, layout: preview.layout.kind },
        meta: {
          name: s.name,
          kind: s.kind,
          variable: s.variable,
          units: s.units,
          region: s.region,
          depthLayer: formatDepthLayer(s.depthLayer),
          source: s.source,
          notes: s.notes,
        },
      }));
    } catch (err) {
      if (err instanceof CsvImportError) throw new BadRequestException(err.message);
      throw err;
    }
  }

  /** 1-D variables of a NetCDF file, named in `columns` by variable name, as series (read in a worker thread). */
  private async seriesFromNetcdf(path: string, body: ImportUploadBody) {
    const wanted = body.columns.flatMap((c) => (c.skip ? [] : [c]));
    if (wanted.length === 0) return [];
    const imported = await netcdfFailureAs4xx(this.jobs.run('netcdf-series', { path, limits: this.config.netcdfLimits, variables: wanted.map((c) => c.column) }));
    return wanted.map((c, i) => {
      const s = imported[i];
      return {
        column: c.column,
        start: s.start,
        values: s.values,
        calendar: s.calendar,
        transform: { type: 'netcdf-variable' as const, variable: c.column },
        meta: {
          name: c.name,
          kind: c.kind,
          variable: c.variable,
          units: c.units || s.units || '',
          region: c.region ?? '',
          depthLayer: formatDepthLayer(c.depthLayer ?? null),
          source: c.source ?? '',
          notes: c.notes ?? '',
        },
      };
    });
  }

  /** Gridded variables to keep as fields (the values stay in the stored file). */
  private async fieldsFromNetcdf(upload: UploadedFile, path: string, body: ImportUploadBody, user: User): Promise<GriddedField[]> {
    if (!body.grids.length) return [];
    if (upload.format === 'csv') throw new BadRequestException('a CSV table has no gridded variables');
    const { fields, extent } = await netcdfFailureAs4xx(this.jobs.run('netcdf-fields', { path, limits: this.config.netcdfLimits }));
    return body.grids.map((g) => {
      const c = fields.find((x) => x.name === g.variable);
      if (!c) throw new BadRequestException(`“${g.variable}” is not a gridded (time, lat, lon) variable of this file`);
      return this.em.create(GriddedField, {
        group: upload.group,
        file: upload,
        variable: c.name,
        longName: g.name,
        units: c.units ?? '',
        dims: c.dims,
        shape: c.shape,
        start: c.start,
        extent,
        createdBy: user,
      });
    });
  }

  /** Existing series that columns should add a version to; each must belong to the upload's group. */
  private async resolveTargets(upload: UploadedFile, targets: Record<string, string>) {
    const out = new Map<string, { series: Series; latest: SeriesVersion | null }>();
    for (const [column, seriesId] of Object.entries(targets)) {
      const series = await this.em.findOne(Series, { id: seriesId, group: upload.group }, { populate: ['group'] });
      if (!series) throw new NotFoundException(`the series chosen for “${column}” is not in this group`);
      const latest = (await this.series.latestVersions([series])).get(series.id) ?? null;
      out.set(column, { series, latest });
    }
    return out;
  }
}
