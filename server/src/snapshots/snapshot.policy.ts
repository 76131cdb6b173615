import { EntityManager } from '@mikro-orm/sqlite';
import { GoneException, Injectable, NotFoundException } from '@nestjs/common';
import type { NotebookAction } from '@upwell/common';
import { createHash } from 'node:crypto';
import { NotebookPolicy, type NotebookAccess } from '../notebooks/notebook.policy';
import type { User } from '../users/user.entity';
import { ShareLink, Snapshot } from './snapshot.entity';

const NO_SUCH_SNAPSHOT = 'no such snapshot, or you have no role on its notebook';

/** sha256 (hex) of a share token: the only form in which tokens are stored. */
export function shareTokenSha256(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** Whether a share link still opens its snapshot, and if not, why. */
export function shareLinkState(link: Pick<ShareLink, 'revokedAt' | 'expiresAt'>, now = new Date()): 'active' | 'expired' | 'revoked' {
  if (link.revokedAt) return 'revoked';
  if (link.expiresAt && link.expiresAt.getTime() <= now.getTime()) return 'expired';
  return 'active';
}

/**
 * Who may do what with a snapshot: what their role on its notebook allows ("a reader may read a
 * snapshot of a notebook they hold a role on; only the lead author may publish or share one"),
 * and anyone holding an active share link may read that one snapshot. Nobody may change a
 * snapshot: there is no such action.
 */
@Injectable()
export class SnapshotPolicy {
  constructor(
    private readonly em: EntityManager,
    private readonly notebooks: NotebookPolicy,
  ) {}

  /** The snapshot, if the person's role on its notebook allows the action; 404 without a role, 403 short of it. */
  async authorize(user: User, snapshotId: string, action: NotebookAction): Promise<{ snapshot: Snapshot; access: NotebookAccess }> {
    const snapshot = await this.em.findOne(Snapshot, { id: snapshotId }, { populate: ['publishedBy'] });
    if (!snapshot) throw new NotFoundException(NO_SUCH_SNAPSHOT);
    try {
      return { snapshot, access: await this.notebooks.authorize(user, snapshot.notebook.id, action) };
    } catch (err) {
      // Without a role the notebook's snapshots do not exist for them either.
      if (err instanceof NotFoundException) throw new NotFoundException(NO_SUCH_SNAPSHOT);
      throw err;
    }
  }

  /** The snapshot a share token opens: 404 for a token never issued, 410 once revoked or expired. */
  async shared(token: string): Promise<Snapshot> {
    // Tokens are 43 base64url characters; anything far off was never issued.
    if (token.length > 128) throw new NotFoundException('no such share link');
    const link = await this.em.findOne(ShareLink, { tokenSha256: shareTokenSha256(token) }, { populate: ['snapshot', 'snapshot.publishedBy'] });
    if (!link) throw new NotFoundException('no such share link');
    const state = shareLinkState(link);
    if (state !== 'active') throw new GoneException(state === 'revoked' ? 'this share link was revoked' : 'this share link has expired');
    return link.snapshot;
  }
}
