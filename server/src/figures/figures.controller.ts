import { Body, Controller, HttpCode, Param, Post, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import { computeFigureRequestSchema } from '@upwell/common';
import type { Response } from 'express';
import { CurrentUser } from '../auth/current-user.decorator';
import { ApiJsonBody } from '../common/api-docs';
import { uuidParam } from '../common/ids';
import { ZodValidationPipe } from '../common/zod-validation.pipe';
import { User } from '../users/user.entity';
import { FiguresService, type ComputeFigureBody } from './figures.service';

@ApiTags('figures')
@ApiBearerAuth()
@Controller('notebooks/:notebookId/figures')
export class FiguresController {
  constructor(private readonly figures: FiguresService) {}

  @Post()
  @HttpCode(200)
  @ApiOperation({
    summary: 'Compute a live figure of the notebook from its group’s stored series (anyone with a role on the notebook)',
    description:
      'Answers { kind, data, numbers, used, methods, cautions, warnings, engineVersion, cacheKey, cached }. "latest" bindings resolve to ' +
      'the newest version; repeats are served from a cache keyed by the recipe and the versions used.',
  })
  @ApiJsonBody(computeFigureRequestSchema)
  async compute(
    @CurrentUser() user: User,
    @Param('notebookId', uuidParam('notebookId')) notebookId: string,
    @Body(new ZodValidationPipe(computeFigureRequestSchema)) body: ComputeFigureBody,
    @Res() res: Response,
  ): Promise<void> {
    // The service answers JSON text (serialized once, reused from the cache), so it is sent as is.
    res.status(200).type('application/json').send(await this.figures.compute(user, notebookId, body));
  }
}
