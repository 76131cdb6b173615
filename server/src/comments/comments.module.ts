import { Module } from '@nestjs/common';
import { DocumentsModule } from '../documents/documents.module';
import { NotebookAccessModule } from '../notebooks/notebook-access.module';
import { NotificationsModule } from '../notifications/notifications.module';
import { CommentPolicy } from './comment.policy';
import { CommentsController } from './comments.controller';
import { CommentsService } from './comments.service';

/** Review threads on notebooks, live over the socket, with mention notifications. */
@Module({
  imports: [NotebookAccessModule, DocumentsModule, NotificationsModule],
  controllers: [CommentsController],
  providers: [CommentsService, CommentPolicy],
})
export class CommentsModule {}
