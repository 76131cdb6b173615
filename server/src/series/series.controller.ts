import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiParam, ApiTags } from '@nestjs/swagger';
import {
  listSeriesQuerySchema,
  updateSeriesRequestSchema,
  versionRefSchema,
  type ListSeriesQuery,
  type UpdateSeriesRequest,
  type VersionRef,
} from '@upwell/common';
import type { Response } from 'express';
import { CurrentUser } from '../auth/current-user.decorator';
import { ApiJsonBody, ApiQueryFrom } from '../common/api-docs';
import { uuidParam } from '../common/ids';
import { ZodValidationPipe } from '../common/zod-validation.pipe';
import { User } from '../users/user.entity';
import { SeriesService } from './series.service';
import { SeriesUsageService } from './series-usage.service';

const versionPipe = new ZodValidationPipe(versionRefSchema);

@ApiTags('series')
@ApiBearerAuth()
@Controller()
export class SeriesController {
  constructor(
    private readonly series: SeriesService,
    private readonly usage: SeriesUsageService,
  ) {}

  @Get('groups/:groupId/series')
  @ApiOperation({ summary: 'The group’s series library: filtered, sorted, paged, with a sparkline each' })
  @ApiQueryFrom(listSeriesQuerySchema)
  list(
    @CurrentUser() user: User,
    @Param('groupId', uuidParam('groupId')) groupId: string,
    @Query(new ZodValidationPipe(listSeriesQuerySchema)) query: ListSeriesQuery,
  ) {
    return this.series.list(user, groupId, query);
  }

  @Get('series/:seriesId')
  @ApiOperation({ summary: 'A series with its metadata and every version’s provenance' })
  detail(@CurrentUser() user: User, @Param('seriesId', uuidParam('seriesId')) seriesId: string) {
    return this.series.detail(user, seriesId);
  }

  @Patch('series/:seriesId')
  @ApiOperation({ summary: 'Change a series’ metadata (group members)' })
  @ApiJsonBody(updateSeriesRequestSchema)
  update(
    @CurrentUser() user: User,
    @Param('seriesId', uuidParam('seriesId')) seriesId: string,
    @Body(new ZodValidationPipe(updateSeriesRequestSchema)) body: UpdateSeriesRequest,
  ) {
    return this.series.update(user, seriesId, body);
  }

  @Get('series/:seriesId/usage')
  @ApiOperation({ summary: 'Notebooks whose figures or live numbers bind this series (asked before deleting it)' })
  usageOf(@CurrentUser() user: User, @Param('seriesId', uuidParam('seriesId')) seriesId: string) {
    return this.usage.usage(user, seriesId);
  }

  @Delete('series/:seriesId')
  @HttpCode(204)
  @ApiOperation({ summary: 'Delete a series and all its versions (group admins)' })
  remove(@CurrentUser() user: User, @Param('seriesId', uuidParam('seriesId')) seriesId: string) {
    return this.series.remove(user, seriesId);
  }

  @Get('series/:seriesId/versions/:version/values')
  @ApiOperation({ summary: 'The monthly values of one version: a number, or "latest"' })
  @ApiParam({ name: 'version', schema: { oneOf: [{ type: 'integer', minimum: 1 }, { type: 'string', enum: ['latest'] }] } })
  values(
    @CurrentUser() user: User,
    @Param('seriesId', uuidParam('seriesId')) seriesId: string,
    @Param('version', versionPipe) version: VersionRef,
  ) {
    return this.series.values(user, seriesId, version);
  }

  @Get('series/:seriesId/versions/:version/csv')
  @ApiOperation({ summary: 'One version as CSV (month,value)' })
  @ApiParam({ name: 'version', schema: { oneOf: [{ type: 'integer', minimum: 1 }, { type: 'string', enum: ['latest'] }] } })
  async csv(
    @CurrentUser() user: User,
    @Param('seriesId', uuidParam('seriesId')) seriesId: string,
    @Param('version', versionPipe) version: VersionRef,
    @Res() res: Response,
  ) {
    const { fileName, body } = await this.series.csv(user, seriesId, version);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="${fileName}"`);
    res.send(body);
  }
}
