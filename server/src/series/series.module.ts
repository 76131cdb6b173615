import { Module } from '@nestjs/common';
import { GroupsModule } from '../groups/groups.module';
import { SeriesController } from './series.controller';
import { SeriesPolicy } from './series.policy';
import { SeriesService } from './series.service';

@Module({
  imports: [GroupsModule],
  controllers: [SeriesController],
  providers: [SeriesService, SeriesPolicy],
  exports: [SeriesService, SeriesPolicy],
})
export class SeriesModule {}
