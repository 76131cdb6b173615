import { Module } from '@nestjs/common';
import { GroupsModule } from '../groups/groups.module';
import { SeriesModule } from '../series/series.module';
import { FieldsController } from './fields.controller';
import { FieldsService } from './fields.service';

@Module({ imports: [GroupsModule, SeriesModule], controllers: [FieldsController], providers: [FieldsService] })
export class FieldsModule {}
