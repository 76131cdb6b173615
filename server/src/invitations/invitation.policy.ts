import { EntityManager } from '@mikro-orm/sqlite';
import { GoneException, Injectable, NotFoundException } from '@nestjs/common';
import { GroupPolicy } from '../groups/group.policy';
import { NotebookPolicy } from '../notebooks/notebook.policy';
import type { User } from '../users/user.entity';
import { Invitation } from './invitation.entity';
import { invitationTokenHash } from './invitation-token';

/** Where invitations are sent from: a group, or one notebook. */
export type InvitationTarget = { kind: 'group'; groupId: string } | { kind: 'notebook'; notebookId: string };

/**
 * Who may do what with invitations: "a group admin invites to the group", "the
 * lead author invites to the notebook" — the same rights as managing members
 * and access directly. Whoever holds a live link may accept it.
 */
@Injectable()
export class InvitationPolicy {
  constructor(
    private readonly em: EntityManager,
    private readonly groups: GroupPolicy,
    private readonly notebooks: NotebookPolicy,
  ) {}

  /** Lets a group admin or the notebook's lead author through; answers the group and notebook ids. */
  async authorizeManage(user: User, target: InvitationTarget): Promise<{ groupId: string; notebookId: string | null }> {
    if (target.kind === 'group') {
      await this.groups.authorize(user, target.groupId, 'manage-members');
      return { groupId: target.groupId, notebookId: null };
    }
    const { notebook } = await this.notebooks.authorize(user, target.notebookId, 'manage-access');
    return { groupId: notebook.group.id, notebookId: notebook.id };
  }

  /** One invitation of the target, after authorizeManage. */
  async findOfTarget(target: { groupId: string; notebookId: string | null }, invitationId: string): Promise<Invitation> {
    const inv = await this.em.findOne(Invitation, {
      id: invitationId,
      group: target.groupId,
      notebook: target.notebookId,
    });
    if (!inv) throw new NotFoundException(`no such invitation to this ${target.notebookId ? 'notebook' : 'group'}`);
    return inv;
  }

  /**
   * The invitation a link's token opens, if it still works: 404 for a token
   * that never was, 410 saying why for one that was used, revoked or expired.
   */
  async live(token: string, em: EntityManager = this.em): Promise<Invitation> {
    const inv = await em.findOne(Invitation, { tokenSha256: invitationTokenHash(token) }, { populate: ['group', 'notebook', 'invitedBy'] });
    if (!inv) throw new NotFoundException('no such invitation: the link is wrong or incomplete');
    if (inv.acceptedAt) throw new GoneException('this invitation has already been used; each link works once');
    if (inv.revokedAt) throw new GoneException('this invitation was revoked by whoever sent it; ask them for a new one');
    if (inv.expiresAt.getTime() <= Date.now()) {
      throw new GoneException(`this invitation expired on ${inv.expiresAt.toISOString()}; ask whoever sent it for a new one`);
    }
    return inv;
  }
}
