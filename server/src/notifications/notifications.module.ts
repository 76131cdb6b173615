import { Module } from '@nestjs/common';
import { NotebookAccessModule } from '../notebooks/notebook-access.module';
import { NotificationsController } from './notifications.controller';
import { NotificationsService } from './notifications.service';

/** In-app notifications (mentions in comments) and the routes to read them. */
@Module({ imports: [NotebookAccessModule], controllers: [NotificationsController], providers: [NotificationsService], exports: [NotificationsService] })
export class NotificationsModule {}
