import { EntityManager } from '@mikro-orm/sqlite';
import { Inject, Injectable, Logger, type OnModuleDestroy } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { loggableError } from '../common/loggable-error';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { Notification } from '../notifications/notification.entity';
import { MailSender } from './mail-sender';
import { mentionDigestMail, mentionMail } from './mail-templates';

interface Pending {
  notificationIds: string[];
  timer: NodeJS.Timeout;
  firstAt: number;
}

/**
 * Mention mail, batched per recipient (and group, since the outbox shows a
 * mail to that group's admins): a mention starts a quiet spell
 * (MENTION_MAIL_QUIET_MS); each further one restarts it; when it passes, one
 * mail carries them all. A steady trickle still gets mail after
 * MENTION_MAIL_MAX_WAIT_MS. Held in memory: mentions waiting when the process
 * stops get no mail, but their in-app notifications are stored.
 */
@Injectable()
export class MentionDigest implements OnModuleDestroy {
  private readonly logger = new Logger('MentionMail');
  private readonly config: AppConfig;
  private readonly pending = new Map<string, Pending>();

  constructor(
    private readonly em: EntityManager,
    private readonly sender: MailSender,
    @Inject(ConfigService) config: ConfigService,
  ) {
    this.config = config.getOrThrow<AppConfig>(APP_CONFIG);
  }

  /** Queues a committed mention notification for its recipient's next mail. */
  add(recipientId: string, groupId: string, notificationId: string): void {
    const key = `${recipientId}:${groupId}`;
    const now = Date.now();
    const held = this.pending.get(key);
    if (held) clearTimeout(held.timer);
    const entry: Pending = held ?? { notificationIds: [], timer: undefined as unknown as NodeJS.Timeout, firstAt: now };
    entry.notificationIds.push(notificationId);
    const wait = Math.max(0, Math.min(this.config.mentionMailQuietMs, entry.firstAt + this.config.mentionMailMaxWaitMs - now));
    entry.timer = setTimeout(() => void this.flush(key), wait);
    entry.timer.unref();
    this.pending.set(key, entry);
  }

  onModuleDestroy(): void {
    for (const p of this.pending.values()) clearTimeout(p.timer);
    if (this.pending.size) this.logger.log(`stopping with mention mail for ${this.pending.size} recipient(s) unsent; their notifications are in the app`);
    this.pending.clear();
  }

  private async flush(key: string): Promise<void> {
    const entry = this.pending.get(key);
    this.pending.delete(key);
    if (!entry) return;
    try {
      const em = this.em.fork();
      const notes = await em.find(Notification, { id: { $in: entry.notificationIds } }, { populate: ['recipient', 'by', 'notebook'], orderBy: { createdAt: 'asc', id: 'asc' } });
      // Someone who turned notification mail off while mentions waited gets none.
      if (!notes.length || !notes[0].recipient.emailNotifications) return;
      const items = notes.map((n) => ({ byName: n.by.name, notebookTitle: n.notebook.title, excerpt: n.excerpt, link: `${this.config.appUrl}/notebooks/${n.notebook.id}` }));
      const settingsUrl = `${this.config.appUrl}/account`;
      const content =
        items.length === 1
          ? mentionMail({ ...items[0], settingsUrl })
          : mentionDigestMail({ items, link: new Set(items.map((i) => i.link)).size === 1 ? items[0].link : this.config.appUrl, settingsUrl });
      await this.sender.send({ ...content, to: notes[0].recipient.email, groupId: notes[0].notebook.group.id });
    } catch (err) {
      this.logger.error(`mention mail failed: ${loggableError(err)}`);
    }
  }
}
