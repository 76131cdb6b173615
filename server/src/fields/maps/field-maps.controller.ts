import { Body, Controller, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import { mapRequestSchema, type MapRequestBody } from '@upwell/common';
import { CurrentUser } from '../../auth/current-user.decorator';
import { ApiJsonBody } from '../../common/api-docs';
import { uuidParam } from '../../common/ids';
import { ZodValidationPipe } from '../../common/zod-validation.pipe';
import { User } from '../../users/user.entity';
import { FieldMapsService } from './field-maps.service';

@ApiTags('fields')
@ApiBearerAuth()
@Controller()
export class FieldMapsController {
  constructor(private readonly maps: FieldMapsService) {}

  @Post('fields/:fieldId/maps')
  @HttpCode(200)
  @ApiOperation({ summary: 'A map of a gridded field: time mean, mean anomaly, event composite, or correlation / regression on an index, with per-cell p and FDR significance' })
  @ApiJsonBody(mapRequestSchema)
  map(
    @CurrentUser() user: User,
    @Param('fieldId', uuidParam('fieldId')) fieldId: string,
    @Body(new ZodValidationPipe(mapRequestSchema)) body: MapRequestBody,
  ) {
    return this.maps.map(user, fieldId, body);
  }
}
