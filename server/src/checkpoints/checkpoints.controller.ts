import { Body, Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import { createCheckpointRequestSchema, type CreateCheckpointRequest } from '@upwell/common';
import { CurrentUser } from '../auth/current-user.decorator';
import { ApiJsonBody } from '../common/api-docs';
import { uuidParam } from '../common/ids';
import { ZodValidationPipe } from '../common/zod-validation.pipe';
import { User } from '../users/user.entity';
import { CheckpointsService } from './checkpoints.service';

@ApiTags('checkpoints')
@ApiBearerAuth()
@Controller('notebooks/:notebookId/checkpoints')
export class CheckpointsController {
  constructor(private readonly checkpoints: CheckpointsService) {}

  @Post()
  @ApiOperation({ summary: 'Name the document as it stands now, for the version history (lead author and co-authors)' })
  @ApiJsonBody(createCheckpointRequestSchema)
  create(
    @CurrentUser() user: User,
    @Param('notebookId', uuidParam('notebookId')) notebookId: string,
    @Body(new ZodValidationPipe(createCheckpointRequestSchema)) body: CreateCheckpointRequest,
  ) {
    return this.checkpoints.create(user, notebookId, body);
  }

  @Get()
  @ApiOperation({ summary: 'The notebook’s checkpoints, newest first (anyone with a role on the notebook)' })
  list(@CurrentUser() user: User, @Param('notebookId', uuidParam('notebookId')) notebookId: string) {
    return this.checkpoints.list(user, notebookId);
  }

  @Post(':checkpointId/restore')
  @HttpCode(200)
  @ApiOperation({
    summary: 'Give the live document the checkpoint’s content, for everyone (lead author and co-authors)',
    description: 'Stored as one ordinary edit and sent to everyone with the notebook open; restoring another checkpoint undoes it.',
  })
  restore(
    @CurrentUser() user: User,
    @Param('notebookId', uuidParam('notebookId')) notebookId: string,
    @Param('checkpointId', uuidParam('checkpointId')) checkpointId: string,
  ) {
    return this.checkpoints.restore(user, notebookId, checkpointId);
  }
}
