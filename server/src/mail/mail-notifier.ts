import { EntityManager } from '@mikro-orm/sqlite';
import { Inject, Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { OnEvent } from '@nestjs/event-emitter';
import { loggableError } from '../common/loggable-error';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { Notebook } from '../notebooks/notebook.entity';
import { NotebookPolicy } from '../notebooks/notebook.policy';
import { Notification } from '../notifications/notification.entity';
import { User } from '../users/user.entity';
import { MAIL_EVENTS, type MentionsCreatedEvent, type SnapshotPublishedEvent } from './mail-events';
import { MailSender } from './mail-sender';
import { snapshotPublishedMail } from './mail-templates';
import { MentionDigest } from './mention-digest';

/**
 * Notification mail: a published snapshot to the notebook's people, a mention
 * to the person mentioned (batched by MentionDigest) — each only if they keep notification mail on.
 * Runs after the change it reports has committed; a failure is logged, never
 * thrown back at whoever caused the event.
 */
@Injectable()
export class MailNotifier {
  private readonly logger = new Logger('MailNotifier');
  private readonly config: AppConfig;

  constructor(
    private readonly em: EntityManager,
    private readonly sender: MailSender,
    private readonly mentions: MentionDigest,
    private readonly notebooks: NotebookPolicy,
    @Inject(ConfigService) config: ConfigService,
  ) {
    this.config = config.getOrThrow<AppConfig>(APP_CONFIG);
  }

  @OnEvent(MAIL_EVENTS.snapshotPublished, { async: true, promisify: true })
  async snapshotPublished(e: SnapshotPublishedEvent): Promise<void> {
    try {
      const em = this.em.fork();
      const notebook = await em.findOne(Notebook, { id: e.notebookId });
      if (!notebook) return;
      const publisher = await em.findOne(User, { id: e.publishedById });
      // A snapshot is sent to whoever may read the notebook (NotebookPolicy), less its publisher and those who turned mail off.
      const readers = await this.notebooks.peopleAllowed(notebook.id, 'read', em);
      const roles = readers.filter((r) => r.user.id !== e.publishedById && r.user.emailNotifications);
      const content = snapshotPublishedMail({
        notebookTitle: notebook.title,
        number: e.number,
        title: e.title,
        publisherName: publisher?.name ?? null,
        link: `${this.config.appUrl}/snapshots/${e.snapshotId}`,
        settingsUrl: this.settingsUrl(),
      });
      // One mail per person: nobody learns the others' addresses.
      for (const r of roles) await this.sender.send({ ...content, to: r.user.email, groupId: notebook.group.id });
    } catch (err) {
      this.logger.error(`snapshot mail for ${e.snapshotId} failed: ${loggableError(err)}`);
    }
  }

  /** Mentions go to the digest, which mails each person once their mentions have come to a quiet spell. */
  @OnEvent(MAIL_EVENTS.mentionsCreated, { async: true, promisify: true })
  async mentionsCreated(e: MentionsCreatedEvent): Promise<void> {
    try {
      const em = this.em.fork();
      const created = await em.find(Notification, { id: { $in: e.notificationIds } }, { populate: ['recipient', 'notebook'] });
      for (const n of created) {
        if (n.recipient.emailNotifications) this.mentions.add(n.recipient.id, n.notebook.group.id, n.id);
      }
    } catch (err) {
      this.logger.error(`mention mail failed: ${loggableError(err)}`);
    }
  }

  private settingsUrl(): string {
    return `${this.config.appUrl}/account`;
  }
}
