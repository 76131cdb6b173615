import { Body, Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import { reduceFieldRequestSchema, type ReduceFieldBody } from '@upwell/common';
import { CurrentUser } from '../auth/current-user.decorator';
import { ApiJsonBody } from '../common/api-docs';
import { uuidParam } from '../common/ids';
import { ZodValidationPipe } from '../common/zod-validation.pipe';
import { User } from '../users/user.entity';
import { FieldsService } from './fields.service';

@ApiTags('fields')
@ApiBearerAuth()
@Controller()
export class FieldsController {
  constructor(private readonly fields: FieldsService) {}

  @Get('groups/:groupId/fields')
  @ApiOperation({ summary: 'Gridded fields kept from uploads, and zonal means made from them' })
  list(@CurrentUser() user: User, @Param('groupId', uuidParam('groupId')) groupId: string) {
    return this.fields.list(user, groupId);
  }

  @Get('zonal-fields/:fieldId')
  @ApiOperation({ summary: 'A zonal-mean field (time × latitude) with its values, for time–latitude diagrams' })
  zonal(@CurrentUser() user: User, @Param('fieldId', uuidParam('fieldId')) fieldId: string) {
    return this.fields.zonal(user, fieldId);
  }

  @Post('fields/:fieldId/reductions')
  @HttpCode(200)
  @ApiOperation({ summary: 'Area-weighted box mean or integral (→ series) or zonal mean over a longitude band (→ time × latitude field)' })
  @ApiJsonBody(reduceFieldRequestSchema)
  reduce(
    @CurrentUser() user: User,
    @Param('fieldId', uuidParam('fieldId')) fieldId: string,
    @Body(new ZodValidationPipe(reduceFieldRequestSchema)) body: ReduceFieldBody,
  ) {
    return this.fields.reduce(user, fieldId, body);
  }
}
