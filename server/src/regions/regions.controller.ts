import { Body, Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import {
  addRegionSetVersionRequestSchema,
  createRegionSetRequestSchema,
  regionalBudgetRequestSchema,
  type AddRegionSetVersionBody,
  type CreateRegionSetBody,
  type RegionalBudgetBody,
} from '@upwell/common';
import { CurrentUser } from '../auth/current-user.decorator';
import { ApiJsonBody } from '../common/api-docs';
import { uuidParam } from '../common/ids';
import { ZodValidationPipe } from '../common/zod-validation.pipe';
import { User } from '../users/user.entity';
import { RegionSetsService } from './region-sets.service';
import { RegionalBudgetsService } from './regional-budgets.service';

@ApiTags('regions')
@ApiBearerAuth()
@Controller()
export class RegionsController {
  constructor(
    private readonly regionSets: RegionSetsService,
    private readonly budgets: RegionalBudgetsService,
  ) {}

  @Get('groups/:groupId/region-sets')
  @ApiOperation({ summary: "A group's region sets (model masks, GeoJSON polygons, standard boxes) with their versions" })
  list(@CurrentUser() user: User, @Param('groupId', uuidParam('groupId')) groupId: string) {
    return this.regionSets.list(user, groupId);
  }

  @Post('groups/:groupId/region-sets')
  @ApiOperation({ summary: 'Make a region set from a NetCDF mask (flag_values/flag_meanings), GeoJSON polygons or standard boxes' })
  @ApiJsonBody(createRegionSetRequestSchema)
  create(
    @CurrentUser() user: User,
    @Param('groupId', uuidParam('groupId')) groupId: string,
    @Body(new ZodValidationPipe(createRegionSetRequestSchema)) body: CreateRegionSetBody,
  ) {
    return this.regionSets.create(user, groupId, body);
  }

  @Get('region-sets/:regionSetId')
  @ApiOperation({ summary: 'A region set with its versions' })
  get(@CurrentUser() user: User, @Param('regionSetId', uuidParam('regionSetId')) id: string) {
    return this.regionSets.get(user, id);
  }

  @Post('region-sets/:regionSetId/versions')
  @ApiOperation({ summary: 'Add a version to a region set' })
  @ApiJsonBody(addRegionSetVersionRequestSchema)
  addVersion(
    @CurrentUser() user: User,
    @Param('regionSetId', uuidParam('regionSetId')) id: string,
    @Body(new ZodValidationPipe(addRegionSetVersionRequestSchema)) body: AddRegionSetVersionBody,
  ) {
    return this.regionSets.addVersion(user, id, body);
  }

  @Post('groups/:groupId/regional-budgets')
  @HttpCode(200)
  @ApiOperation({ summary: 'Regional 0–H m and full-depth budgets (terms, inventory, residual) from native-grid budget-term fields, stored as derived series' })
  @ApiJsonBody(regionalBudgetRequestSchema)
  budget(
    @CurrentUser() user: User,
    @Param('groupId', uuidParam('groupId')) groupId: string,
    @Body(new ZodValidationPipe(regionalBudgetRequestSchema)) body: RegionalBudgetBody,
  ) {
    return this.budgets.compute(user, groupId, body);
  }
}
