import { Global, Module } from '@nestjs/common';
import { GroupsModule } from '../groups/groups.module';
import { NotebookAccessModule } from '../notebooks/notebook-access.module';
import { MailCatcher } from './mail-catcher';
import { MailController } from './mail.controller';
import { MailNotifier } from './mail-notifier';
import { MailSender } from './mail-sender';
import { MailService } from './mail.service';

/** Sending mail (SMTP_URL or the local catcher), notification mail, and the local outbox. */
@Global()
@Module({ imports: [GroupsModule, NotebookAccessModule], controllers: [MailController], providers: [MailCatcher, MailSender, MailNotifier, MailService], exports: [MailSender] })
export class MailModule {}
