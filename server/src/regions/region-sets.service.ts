import { EntityManager } from '@mikro-orm/sqlite';
import { Injectable } from '@nestjs/common';
import type { AddRegionSetVersionBody, CreateRegionSetBody, RegionSetList, RegionSetSource, RegionSetView } from '@upwell/common';
import { GroupPolicy } from '../groups/group.policy';
import type { UploadedFile } from '../uploads/uploaded-file.entity';
import type { User } from '../users/user.entity';
import { RegionSet, RegionSetVersion } from './region-set.entity';
import { RegionSetPolicy } from './region-set.policy';
import { presentRegionSet } from './region-set.presenter';
import { readRegionSource, type ReadRegionSource } from './region-set-source';
import { UploadedNetcdf } from './uploaded-netcdf';

/** A group's region sets and their versions. */
@Injectable()
export class RegionSetsService {
  constructor(
    private readonly em: EntityManager,
    private readonly groups: GroupPolicy,
    private readonly policy: RegionSetPolicy,
    private readonly uploads: UploadedNetcdf,
  ) {}

  async list(user: User, groupId: string): Promise<RegionSetList> {
    await this.groups.authorize(user, groupId, 'view');
    const sets = await this.em.find(RegionSet, { group: groupId }, { populate: ['group'], orderBy: { name: 'asc' } });
    const versions = await this.em.find(RegionSetVersion, { regionSet: sets }, { populate: ['file'] });
    return { regionSets: sets.map((s) => presentRegionSet(s, versions.filter((v) => v.regionSet.id === s.id))) };
  }

  async get(user: User, id: string): Promise<RegionSetView> {
    const set = await this.policy.authorize(user, id, 'view');
    return presentRegionSet(set, await this.em.find(RegionSetVersion, { regionSet: set }, { populate: ['file'] }));
  }

  async create(user: User, groupId: string, body: CreateRegionSetBody): Promise<RegionSetView> {
    const membership = await this.groups.authorize(user, groupId, 'upload-series');
    const read = await this.read(groupId, body.source);
    const set = await this.em.transactional(async (em) => {
      const created = em.create(RegionSet, { group: membership.group, name: body.name, createdBy: user });
      this.addVersionTo(em, created, user, read);
      return created;
    });
    return this.get(user, set.id);
  }

  async addVersion(user: User, id: string, body: AddRegionSetVersionBody): Promise<RegionSetView> {
    const set = await this.policy.authorize(user, id, 'upload-series');
    const read = await this.read(set.group.id, body.source);
    await this.em.transactional(async (em) => {
      this.addVersionTo(em, set, user, read);
    });
    return this.get(user, set.id);
  }

  private async read(groupId: string, source: RegionSetSource): Promise<ReadRegionSource & { file: UploadedFile | null }> {
    if (source.kind !== 'mask') return { ...readRegionSource(source, null), file: null };
    const upload = await this.uploads.find(groupId, source.uploadId);
    return { ...(await this.uploads.with(upload, (f) => readRegionSource(source, f))), file: upload };
  }

  private addVersionTo(em: EntityManager, set: RegionSet, user: User, read: ReadRegionSource & { file: UploadedFile | null }): void {
    set.latestVersion += 1;
    em.create(RegionSetVersion, { regionSet: set, number: set.latestVersion, kind: read.kind, regions: read.regions, definition: read.definition, grid: read.grid, codes: read.codes, file: read.file, createdBy: user });
    if (read.file && !read.file.importedAt) read.file.importedAt = new Date();
  }
}
