import { EntityManager } from '@mikro-orm/sqlite';
import { BadRequestException, ConflictException, ForbiddenException, GoneException, Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import {
  GROUP_ROLES,
  NOTEBOOK_ROLE_LABELS,
  NOTEBOOK_ROLES,
  registerRequestSchema,
  type AcceptInvitationRequest,
  type AcceptInvitationResponse,
  type CreatedInvitationView,
  type GroupRole,
  type InvitationList,
  type InvitationPreview,
  type NotebookRole,
} from '@upwell/common';
import { AuthService } from '../auth/auth.service';
import { DocumentAccess } from '../collaboration/document-access';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { Group, GroupMembership } from '../groups/group.entity';
import { MailSender } from '../mail/mail-sender';
import { invitationMail } from '../mail/mail-templates';
import { Notebook, NotebookRoleAssignment } from '../notebooks/notebook.entity';
import { RealtimeEvents } from '../realtime/realtime-events';
import { User } from '../users/user.entity';
import { presentUser } from '../users/user.presenter';
import { Invitation } from './invitation.entity';
import { InvitationPolicy, type InvitationTarget } from './invitation.policy';
import { presentInvitation } from './invitation.presenter';
import { invitationTokenHash, newInvitationToken } from './invitation-token';

type TargetIds = { groupId: string; notebookId: string | null };

const roleWords = (inv: { kind: string; role: string }) =>
  inv.kind === 'notebook' ? NOTEBOOK_ROLE_LABELS[inv.role as NotebookRole].toLowerCase() : `group ${inv.role}`;

/** Invitations by e-mail to a group or a notebook: sent, listed, revoked, previewed and accepted. */
@Injectable()
export class InvitationsService {
  private readonly config: AppConfig;

  constructor(
    private readonly em: EntityManager,
    private readonly policy: InvitationPolicy,
    private readonly auth: AuthService,
    private readonly mail: MailSender,
    private readonly events: RealtimeEvents,
    private readonly documentAccess: DocumentAccess,
    @Inject(ConfigService) config: ConfigService,
  ) {
    this.config = config.getOrThrow<AppConfig>(APP_CONFIG);
  }

  /**
   * Sends an invitation. A pending one to the same address for the same place
   * is revoked, so only the newest link works. The invitation is kept even if
   * the mail fails; the answer says `mailSent: false` and why.
   */
  async create(user: User, target: InvitationTarget, body: { email: string; role: string }): Promise<CreatedInvitationView> {
    const ids = await this.policy.authorizeManage(user, target);
    await this.refuseIfHeld(ids, body.email, body.role);
    const token = newInvitationToken();
    const now = new Date();
    const invitation = await this.em.transactional(async (em) => {
      await em.nativeUpdate(
        Invitation,
        { group: ids.groupId, notebook: ids.notebookId, email: body.email, acceptedAt: null, revokedAt: null },
        { revokedAt: now },
      );
      return em.create(Invitation, {
        kind: target.kind,
        group: em.getReference(Group, ids.groupId),
        notebook: ids.notebookId ? em.getReference(Notebook, ids.notebookId) : null,
        email: body.email,
        role: body.role,
        tokenSha256: invitationTokenHash(token),
        invitedBy: user,
        expiresAt: new Date(now.getTime() + this.config.invitationTtlHours * 3_600_000),
      });
    });
    await this.em.populate(invitation, ['group', 'notebook']);
    const content = invitationMail({
      inviterName: user.name,
      groupName: invitation.group.name,
      notebookTitle: invitation.notebook?.title ?? null,
      role: roleWords(invitation),
      link: `${this.config.appUrl}/invitations/${token}`,
      expiresAt: invitation.expiresAt,
    });
    const sent = await this.mail.send({ ...content, to: body.email, groupId: ids.groupId });
    return { ...presentInvitation(invitation), mailSent: sent.sent, mailError: sent.sent ? null : `the invitation was kept but its mail could not be sent: ${sent.reason}` };
  }

  async listPending(user: User, target: InvitationTarget): Promise<InvitationList> {
    const ids = await this.policy.authorizeManage(user, target);
    const pending = await this.em.find(
      Invitation,
      { group: ids.groupId, notebook: ids.notebookId, acceptedAt: null, revokedAt: null, expiresAt: { $gt: new Date() } },
      { populate: ['invitedBy'], orderBy: { createdAt: 'desc', id: 'desc' } },
    );
    return { invitations: pending.map(presentInvitation) };
  }

  async revoke(user: User, target: InvitationTarget, invitationId: string): Promise<void> {
    const ids = await this.policy.authorizeManage(user, target);
    const inv = await this.policy.findOfTarget(ids, invitationId);
    if (inv.acceptedAt) throw new ConflictException(`this invitation was already accepted; change ${inv.email}’s role instead`);
    inv.revokedAt ??= new Date();
    await this.em.flush();
  }

  /** What a link offers, for the accept page; nothing secret beyond what the mail already said. */
  async preview(token: string): Promise<InvitationPreview> {
    const inv = await this.policy.live(token);
    return {
      kind: inv.kind,
      groupName: inv.group.name,
      notebookTitle: inv.notebook?.title ?? null,
      role: inv.role,
      invitedBy: inv.invitedBy ? presentUser(inv.invitedBy) : null,
      email: inv.email,
      expiresAt: inv.expiresAt.toISOString(),
      accountExists: (await this.em.count(User, { email: inv.email })) > 0,
    };
  }

  /**
   * Accepts a link: as the signed-in person if a bearer token came (their
   * e-mail must be the invited one), else by signing in to or creating the
   * invited account. The link is claimed and the role granted in one transaction.
   */
  async accept(token: string, body: AcceptInvitationRequest, bearer: string | null): Promise<AcceptInvitationResponse> {
    const inv = await this.policy.live(token);
    const { accessToken, user } = await this.personFor(inv, body, bearer);
    const granted = await this.em.transactional(async (em) => {
      const claimed = await em.nativeUpdate(Invitation, { id: inv.id, acceptedAt: null, revokedAt: null }, { acceptedAt: new Date(), acceptedBy: user.id });
      if (claimed !== 1) throw new GoneException('this invitation has already been used; each link works once');
      return this.grant(em, inv, user);
    });
    await this.events.setGroupMembership(user.id, inv.group.id, true);
    if (inv.notebook) await this.documentAccess.accessChanged({ notebookId: inv.notebook.id, userId: user.id });
    return { accessToken, user: presentUser(user), granted };
  }

  private async personFor(inv: Invitation, body: AcceptInvitationRequest, bearer: string | null): Promise<{ accessToken: string; user: User }> {
    if (bearer !== null) {
      const user = await this.auth.userForToken(bearer);
      if (!user) throw new UnauthorizedException('your sign-in has expired; sign in again, or open the link signed out');
      if (user.email !== inv.email) {
        throw new ForbiddenException(
          `this invitation is for ${inv.email}, but you are signed in as ${user.email}; sign out and open the link again, or ask for an invitation to your own address`,
        );
      }
      return { accessToken: bearer, user };
    }
    if (!body.password) throw new BadRequestException('password is required: sign in to the invited account, or choose one to create it');
    const accountExists = (await this.em.count(User, { email: inv.email })) > 0;
    let auth;
    if (accountExists) {
      auth = await this.auth.login({ email: inv.email, password: body.password });
    } else {
      const parsed = registerRequestSchema.safeParse({ name: body.name, email: inv.email, password: body.password });
      if (!parsed.success) {
        throw new BadRequestException({
          message: parsed.error.issues.map((i) => i.message).join('; '),
          issues: parsed.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message })),
        });
      }
      auth = await this.auth.register(parsed.data);
    }
    return { accessToken: auth.accessToken, user: await this.em.findOneOrFail(User, { id: auth.user.id }) };
  }

  /** Gives the invited role; a notebook role brings group membership with it. Never lowers a role already held. */
  private async grant(em: EntityManager, inv: Invitation, user: User): Promise<AcceptInvitationResponse['granted']> {
    const membership = await em.findOne(GroupMembership, { group: inv.group.id, user });
    const groupRole: GroupRole = inv.kind === 'group' ? (inv.role as GroupRole) : 'member';
    if (!membership) em.create(GroupMembership, { group: em.getReference(Group, inv.group.id), user, role: groupRole });
    else if (GROUP_ROLES.indexOf(groupRole) < GROUP_ROLES.indexOf(membership.role)) membership.role = groupRole;
    if (inv.notebook) {
      const role = inv.role as NotebookRole;
      const held = await em.findOne(NotebookRoleAssignment, { notebook: inv.notebook.id, user });
      if (!held) em.create(NotebookRoleAssignment, { notebook: em.getReference(Notebook, inv.notebook.id), user, role });
      else if (NOTEBOOK_ROLES.indexOf(role) < NOTEBOOK_ROLES.indexOf(held.role)) held.role = role;
    }
    return { kind: inv.kind, groupId: inv.group.id, notebookId: inv.notebook?.id ?? null, role: inv.role };
  }

  /** 409 when the address's account already holds this role or a stronger one there. */
  private async refuseIfHeld(ids: TargetIds, email: string, role: string): Promise<void> {
    const person = await this.em.findOne(User, { email });
    if (!person) return;
    if (ids.notebookId) {
      const held = await this.em.findOne(NotebookRoleAssignment, { notebook: ids.notebookId, user: person });
      if (held && NOTEBOOK_ROLES.indexOf(held.role) <= NOTEBOOK_ROLES.indexOf(role as NotebookRole)) {
        throw new ConflictException(`${person.name} (${email}) is already ${NOTEBOOK_ROLE_LABELS[held.role].toLowerCase()} of this notebook`);
      }
      return;
    }
    const member = await this.em.findOne(GroupMembership, { group: ids.groupId, user: person });
    if (member && GROUP_ROLES.indexOf(member.role) <= GROUP_ROLES.indexOf(role as GroupRole)) {
      throw new ConflictException(`${person.name} (${email}) is already ${member.role === 'admin' ? 'an admin' : 'a member'} of this group`);
    }
  }
}
