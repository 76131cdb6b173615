import { Body, Controller, Delete, Get, HttpCode, Param, Post, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import { detectEventSetRequestSchema, saveEventSetRequestSchema } from '@upwell/common';
import { CurrentUser } from '../auth/current-user.decorator';
import { ApiJsonBody } from '../common/api-docs';
import { uuidParam } from '../common/ids';
import { ZodValidationPipe } from '../common/zod-validation.pipe';
import { User } from '../users/user.entity';
import { EventSetsService, type DetectEventSetBody, type SaveEventSetBody } from './event-sets.service';

const saveBody = new ZodValidationPipe(saveEventSetRequestSchema);

@ApiTags('event-sets')
@ApiBearerAuth()
@Controller('notebooks/:notebookId/event-sets')
export class EventSetsController {
  constructor(private readonly sets: EventSetsService) {}

  @Get()
  @ApiOperation({ summary: 'The notebook’s saved event sets (anyone with a role on the notebook)' })
  list(@CurrentUser() user: User, @Param('notebookId', uuidParam('notebookId')) notebookId: string) {
    return this.sets.list(user, notebookId);
  }

  @Post('detect')
  @HttpCode(200)
  @ApiOperation({
    summary: 'Detect warm and cold events in an index by the operational rule, without saving them',
    description: 'Answers { index, events, methods, warnings }; edit the events and save them with POST event-sets.',
  })
  @ApiJsonBody(detectEventSetRequestSchema)
  detect(
    @CurrentUser() user: User,
    @Param('notebookId', uuidParam('notebookId')) notebookId: string,
    @Body(new ZodValidationPipe(detectEventSetRequestSchema)) body: DetectEventSetBody,
  ) {
    return this.sets.detect(user, notebookId, body);
  }

  @Post()
  @ApiOperation({ summary: 'Save an event set (lead author and co-authors); events sorted by start, not overlapping' })
  @ApiJsonBody(saveEventSetRequestSchema)
  create(@CurrentUser() user: User, @Param('notebookId', uuidParam('notebookId')) notebookId: string, @Body(saveBody) body: SaveEventSetBody) {
    return this.sets.create(user, notebookId, body);
  }

  @Put(':eventSetId')
  @ApiOperation({ summary: 'Replace an event set’s name and events (lead author and co-authors)' })
  @ApiJsonBody(saveEventSetRequestSchema)
  update(
    @CurrentUser() user: User,
    @Param('notebookId', uuidParam('notebookId')) notebookId: string,
    @Param('eventSetId', uuidParam('eventSetId')) eventSetId: string,
    @Body(saveBody) body: SaveEventSetBody,
  ) {
    return this.sets.update(user, notebookId, eventSetId, body);
  }

  @Delete(':eventSetId')
  @HttpCode(204)
  @ApiOperation({ summary: 'Delete an event set (lead author and co-authors)' })
  remove(
    @CurrentUser() user: User,
    @Param('notebookId', uuidParam('notebookId')) notebookId: string,
    @Param('eventSetId', uuidParam('eventSetId')) eventSetId: string,
  ) {
    return this.sets.remove(user, notebookId, eventSetId);
  }
}
