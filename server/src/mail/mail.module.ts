import { Global, Module } from '@nestjs/common';
import { GroupsModule } from '../groups/groups.module';
import { NotebookAccessModule } from '../notebooks/notebook-access.module';
import { LocalMailbox } from './local-mailbox';
import { MailController } from './mail.controller';
import { MailNotifier } from './mail-notifier';
import { MailSender } from './mail-sender';
import { MentionDigest } from './mention-digest';
import { MailService } from './mail.service';

/** Sending mail (SMTP_URL or the local mailbox), notification mail, and the local outbox. */
@Global()
@Module({ imports: [GroupsModule, NotebookAccessModule], controllers: [MailController], providers: [LocalMailbox, MailSender, MailNotifier, MentionDigest, MailService], exports: [MailSender] })
export class MailModule {}
