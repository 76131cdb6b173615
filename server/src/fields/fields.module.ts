import { Module } from '@nestjs/common';
import { GroupsModule } from '../groups/groups.module';
import { NotebookAccessModule } from '../notebooks/notebook-access.module';
import { SeriesModule } from '../series/series.module';
import { FieldsController } from './fields.controller';
import { FieldsService } from './fields.service';
import { FieldMapsController } from './maps/field-maps.controller';
import { FieldMapsService } from './maps/field-maps.service';

@Module({
  imports: [GroupsModule, SeriesModule, NotebookAccessModule],
  controllers: [FieldsController, FieldMapsController],
  providers: [FieldsService, FieldMapsService],
})
export class FieldsModule {}
