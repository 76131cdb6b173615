import { EntityManager } from '@mikro-orm/sqlite';
import { BadRequestException, Injectable, NotFoundException, UnprocessableEntityException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { join } from 'node:path';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { NetcdfImportError } from '../series/netcdf/netcdf-import-error';
import { openNetcdf } from '../series/netcdf/open-netcdf';
import type { NetcdfFile } from '../series/netcdf/types';
import { UploadedFile } from '../uploads/uploaded-file.entity';

/** Opens a group's uploaded NetCDF file for one piece of work; reading problems become 422 naming where. */
@Injectable()
export class UploadedNetcdf {
  private readonly dataDir: string;

  constructor(
    private readonly em: EntityManager,
    config: ConfigService,
  ) {
    this.dataDir = config.getOrThrow<AppConfig>(APP_CONFIG).dataDir;
  }

  /** The upload of that group (404 otherwise), which must be NetCDF (400). */
  async find(groupId: string, uploadId: string): Promise<UploadedFile> {
    const upload = await this.em.findOne(UploadedFile, { id: uploadId, group: groupId });
    if (!upload) throw new NotFoundException('no such upload in this group');
    if (upload.format === 'csv') throw new BadRequestException(`${upload.originalName} is a CSV table; gridded terms and masks come in NetCDF files`);
    return upload;
  }

  async with<T>(upload: UploadedFile, work: (file: NetcdfFile) => T): Promise<T> {
    let file: NetcdfFile | null = null;
    try {
      file = await openNetcdf(join(this.dataDir, upload.storedPath));
      return work(file);
    } catch (err) {
      if (err instanceof NetcdfImportError) {
        throw new UnprocessableEntityException({ statusCode: 422, error: 'Unprocessable Entity', message: err.message, code: err.code, where: err.where });
      }
      throw err;
    } finally {
      file?.close();
    }
  }
}
