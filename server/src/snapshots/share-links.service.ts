import { EntityManager } from '@mikro-orm/sqlite';
import { Injectable, NotFoundException } from '@nestjs/common';
import { SNAPSHOT_LIMITS, type ShareLinkCreated, type ShareLinkView } from '@upwell/common';
import { randomBytes } from 'node:crypto';
import { User } from '../users/user.entity';
import { ShareLink } from './snapshot.entity';
import { SnapshotPolicy, shareTokenSha256 } from './snapshot.policy';
import { presentShareLink } from './snapshot.presenter';
import { SnapshotsService } from './snapshots.service';

/**
 * Public links to single snapshots. A token is 32 bytes from the system CSPRNG (256 bits, well
 * above the 128 bits RFC 4086 and OWASP ask of unguessable identifiers), sent once, stored only
 * as its sha256, so a copy of the database opens nothing.
 */
@Injectable()
export class ShareLinksService {
  constructor(
    private readonly em: EntityManager,
    private readonly policy: SnapshotPolicy,
    private readonly snapshots: SnapshotsService,
  ) {}

  async create(user: User, snapshotId: string, expiresAt: string | null): Promise<ShareLinkCreated> {
    const { snapshot } = await this.policy.authorize(user, snapshotId, 'publish');
    const token = randomBytes(SNAPSHOT_LIMITS.shareTokenBytes).toString('base64url');
    const link = this.em.create(ShareLink, {
      snapshot,
      tokenSha256: shareTokenSha256(token),
      tokenHint: token.slice(-4),
      createdBy: user,
      expiresAt: expiresAt ? new Date(expiresAt) : null,
    });
    await this.em.flush();
    return { ...presentShareLink(link), token, url: `/shared/${token}` };
  }

  /** The snapshot's links, newest first, revoked and expired ones included. */
  async list(user: User, snapshotId: string): Promise<{ links: ShareLinkView[] }> {
    await this.policy.authorize(user, snapshotId, 'publish');
    const links = await this.em.find(ShareLink, { snapshot: snapshotId }, { populate: ['createdBy'], orderBy: { createdAt: 'desc', id: 'asc' } });
    const now = new Date();
    return { links: links.map((l) => presentShareLink(l, now)) };
  }

  /** Revokes a link for good; it stays listed as revoked. Revoking twice changes nothing. */
  async revoke(user: User, snapshotId: string, linkId: string): Promise<void> {
    await this.policy.authorize(user, snapshotId, 'publish');
    const link = await this.em.findOne(ShareLink, { id: linkId, snapshot: snapshotId });
    if (!link) throw new NotFoundException('this snapshot has no such share link');
    link.revokedAt ??= new Date();
    await this.em.flush();
  }

  /** The snapshot's JSON for anyone holding an active link. */
  async sharedJson(token: string): Promise<string> {
    return this.snapshots.jsonOf(await this.policy.shared(token));
  }

  /** The snapshot's HTML file for anyone holding an active link. */
  async sharedHtml(token: string): Promise<{ html: string; fileName: string }> {
    return this.snapshots.htmlOf(await this.policy.shared(token));
  }
}
