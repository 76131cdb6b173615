import { Inject, Injectable, Logger, type OnModuleDestroy } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { createTransport, type Transporter } from 'nodemailer';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { GROUP_HEADER, LocalMailbox } from './local-mailbox';

/** A mail ready to send: both bodies, and the group it concerns (for the local outbox). */
export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
  groupId: string | null;
}

/** What came of sending: sent, or not with the reason. */
export type SendResult = { sent: true } | { sent: false; reason: string };

/** Sends mail with nodemailer over SMTP: to SMTP_URL, or to the local mailbox when it is unset. */
@Injectable()
export class MailSender implements OnModuleDestroy {
  private readonly logger = new Logger('Mail');
  private transport: Transporter | null = null;
  private readonly config: AppConfig;

  constructor(
    @Inject(ConfigService) config: ConfigService,
    private readonly mailbox: LocalMailbox,
  ) {
    this.config = config.getOrThrow<AppConfig>(APP_CONFIG);
  }

  /** Sends one mail; never throws: a failure is logged and answered as `{ sent: false, reason }`. */
  async send(mail: OutgoingMail): Promise<SendResult> {
    try {
      await this.transporter().sendMail({
        from: this.config.mailFrom,
        to: mail.to,
        subject: mail.subject,
        text: mail.text,
        html: mail.html,
        headers: mail.groupId ? { [GROUP_HEADER]: mail.groupId } : {},
      });
      return { sent: true };
    } catch (err) {
      const reason = err instanceof Error ? err.message : String(err);
      this.logger.warn(`could not send “${mail.subject}” to ${mail.to}: ${reason}`);
      return { sent: false, reason };
    }
  }

  onModuleDestroy(): void {
    this.transport?.close();
  }

  private transporter(): Transporter {
    this.transport ??= this.config.smtpUrl
      ? createTransport(this.config.smtpUrl)
      : // The local mailbox speaks plain SMTP on loopback (RFC 5321); no TLS to negotiate.
        createTransport({ host: '127.0.0.1', port: this.mailbox.port, secure: false, ignoreTLS: true });
    return this.transport;
  }
}
