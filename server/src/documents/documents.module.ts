import { Module } from '@nestjs/common';
import { NotebookAccessModule } from '../notebooks/notebook-access.module';
import { DocumentsController } from './documents.controller';
import { DocumentsService } from './documents.service';

@Module({ imports: [NotebookAccessModule], controllers: [DocumentsController], providers: [DocumentsService], exports: [DocumentsService] })
export class DocumentsModule {}
