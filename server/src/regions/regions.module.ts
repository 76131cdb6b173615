import { Module } from '@nestjs/common';
import { GroupsModule } from '../groups/groups.module';
import { SeriesModule } from '../series/series.module';
import { RegionSetPolicy } from './region-set.policy';
import { RegionSetsService } from './region-sets.service';
import { RegionalBudgetsService } from './regional-budgets.service';
import { RegionsController } from './regions.controller';
import { UploadedNetcdf } from './uploaded-netcdf';

/** Region sets (masks, polygons, standard boxes) and regional budgets on native model grids. */
@Module({ imports: [GroupsModule, SeriesModule], controllers: [RegionsController], providers: [RegionSetPolicy, RegionSetsService, RegionalBudgetsService, UploadedNetcdf] })
export class RegionsModule {}
