import { EntityManager } from '@mikro-orm/sqlite';
import { Injectable, NotFoundException } from '@nestjs/common';
import type { CapturedMail, MailOutbox, MailStatus } from '@upwell/common';
import { GroupPolicy } from '../groups/group.policy';
import type { User } from '../users/user.entity';
import { LocalMailbox } from './local-mailbox';
import { withSecretLinksHidden } from './secret-links';

const NO_MAILBOX = 'no local mailbox in use: mail goes out through SMTP_URL';

/**
 * The local outbox: what the local mailbox received, shown to admins of the
 * group a mail concerns and to its addressee. Only the addressee sees secret
 * links (invitations); everyone else sees that the mail went, link hidden.
 */
@Injectable()
export class MailService {
  constructor(
    private readonly em: EntityManager,
    private readonly mailbox: LocalMailbox,
    private readonly groups: GroupPolicy,
  ) {}

  status(): MailStatus {
    return { fake: this.mailbox.active };
  }

  async outbox(user: User): Promise<MailOutbox> {
    if (!this.mailbox.active) throw new NotFoundException(NO_MAILBOX);
    const groups = await this.adminGroups(user);
    const all = await this.mailbox.list();
    const visible = all.filter((m) => this.isAddressee(m, user) || (m.groupId !== null && groups.has(m.groupId)));
    return { fake: true, messages: visible.map((m) => this.asSeenBy(m, user)) };
  }

  async message(user: User, id: string): Promise<CapturedMail> {
    if (!this.mailbox.active) throw new NotFoundException(NO_MAILBOX);
    const m = await this.mailbox.get(id);
    // Mail neither to this person nor about a group they administer does not exist for them.
    if (!m || (!this.isAddressee(m, user) && (m.groupId === null || !(await this.adminGroups(user)).has(m.groupId)))) {
      throw new NotFoundException('no such captured message among your mail and the mail of groups you administer');
    }
    return this.asSeenBy(m, user);
  }

  private isAddressee(m: CapturedMail, user: User): boolean {
    return m.to.some((a) => a.toLowerCase() === user.email);
  }

  private asSeenBy(m: CapturedMail, user: User): CapturedMail {
    return this.isAddressee(m, user) ? m : withSecretLinksHidden(m);
  }

  /** The groups whose mail the person may read (GroupPolicy: 'read-mail', admins). */
  private adminGroups(user: User): Promise<Set<string>> {
    return this.groups.groupsAllowing(user, 'read-mail');
  }
}
