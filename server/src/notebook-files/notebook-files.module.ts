import { Module } from '@nestjs/common';
import { DocumentsModule } from '../documents/documents.module';
import { GroupsModule } from '../groups/groups.module';
import { NotebookAccessModule } from '../notebooks/notebook-access.module';
import { NotebookFilesController } from './notebook-files.controller';
import { NotebookFilesService } from './notebook-files.service';

/** Export and import of notebooks as Upwell notebook files (example-notebooks/README.md). */
@Module({
  imports: [NotebookAccessModule, GroupsModule, DocumentsModule],
  controllers: [NotebookFilesController],
  providers: [NotebookFilesService],
  exports: [NotebookFilesService],
})
export class NotebookFilesModule {}
