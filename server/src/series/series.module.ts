import { Module } from '@nestjs/common';
import { DocumentsModule } from '../documents/documents.module';
import { GroupsModule } from '../groups/groups.module';
import { NotebookAccessModule } from '../notebooks/notebook-access.module';
import { SeriesUsageService } from './series-usage.service';
import { SeriesController } from './series.controller';
import { SeriesPolicy } from './series.policy';
import { SeriesService } from './series.service';

@Module({
  imports: [GroupsModule, DocumentsModule, NotebookAccessModule],
  controllers: [SeriesController],
  providers: [SeriesService, SeriesPolicy, SeriesUsageService],
  exports: [SeriesService, SeriesPolicy],
})
export class SeriesModule {}
