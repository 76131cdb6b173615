import { Module } from '@nestjs/common';
import { CollaborationModule } from '../collaboration/collaboration.module';
import { DocumentsModule } from '../documents/documents.module';
import { GroupsModule } from '../groups/groups.module';
import { NotebookAccessModule } from './notebook-access.module';
import { NotebooksController } from './notebooks.controller';
import { NotebooksService } from './notebooks.service';

@Module({
  imports: [GroupsModule, NotebookAccessModule, DocumentsModule, CollaborationModule],
  controllers: [NotebooksController],
  providers: [NotebooksService],
  exports: [NotebookAccessModule],
})
export class NotebooksModule {}
