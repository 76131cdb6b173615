import { EntityManager } from '@mikro-orm/sqlite';
import { Injectable, NotFoundException } from '@nestjs/common';
import type { CapturedMail, MailOutbox, MailStatus } from '@upwell/common';
import { GroupPolicy } from '../groups/group.policy';
import type { User } from '../users/user.entity';
import { MailCatcher } from './mail-catcher';

const NO_CATCHER = 'no local mail catcher in use: mail goes out through SMTP_URL';

/** The local outbox: what the mail catcher received, shown only to admins of the group a mail concerns. */
@Injectable()
export class MailService {
  constructor(
    private readonly em: EntityManager,
    private readonly catcher: MailCatcher,
    private readonly groups: GroupPolicy,
  ) {}

  status(): MailStatus {
    return { fake: this.catcher.active };
  }

  async outbox(user: User): Promise<MailOutbox> {
    if (!this.catcher.active) throw new NotFoundException(NO_CATCHER);
    const groups = await this.adminGroups(user);
    const all = await this.catcher.list();
    return { fake: true, messages: all.filter((m) => m.groupId !== null && groups.has(m.groupId)) };
  }

  async message(user: User, id: string): Promise<CapturedMail> {
    if (!this.catcher.active) throw new NotFoundException(NO_CATCHER);
    const m = await this.catcher.get(id);
    // Someone else's group's mail does not exist for this person.
    if (!m || m.groupId === null || !(await this.adminGroups(user)).has(m.groupId)) {
      throw new NotFoundException('no such captured message among the mail of groups you administer');
    }
    return m;
  }

  /** The groups whose mail the person may read (GroupPolicy: 'read-mail', admins). */
  private adminGroups(user: User): Promise<Set<string>> {
    return this.groups.groupsAllowing(user, 'read-mail');
  }
}
