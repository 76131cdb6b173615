import { Body, Controller, Delete, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import { createCommentReplyRequestSchema, createCommentThreadRequestSchema, listCommentsQuerySchema, type CommentStatusFilter } from '@upwell/common';
import { CurrentUser } from '../auth/current-user.decorator';
import { ApiJsonBody, ApiQueryFrom } from '../common/api-docs';
import { uuidParam } from '../common/ids';
import { ZodValidationPipe } from '../common/zod-validation.pipe';
import { User } from '../users/user.entity';
import { CommentsService, type CreateReplyBody, type CreateThreadBody } from './comments.service';

const notebookParam = uuidParam('notebookId');
const threadParam = uuidParam('threadId');

@ApiTags('comments')
@ApiBearerAuth()
@Controller('notebooks/:notebookId/comments')
export class CommentsController {
  constructor(private readonly comments: CommentsService) {}

  @Get()
  @ApiOperation({ summary: 'Review threads of a notebook, numbered in document order (anyone with a role on it)', description: 'Answers { threads, open, resolved }.' })
  @ApiQueryFrom(listCommentsQuerySchema)
  list(
    @CurrentUser() user: User,
    @Param('notebookId', notebookParam) notebookId: string,
    @Query(new ZodValidationPipe(listCommentsQuerySchema)) q: { status: CommentStatusFilter },
  ) {
    return this.comments.list(user, notebookId, q.status);
  }

  @Post()
  @ApiOperation({ summary: 'Open a thread on a passage or a figure (lead author, co-authors, reviewers); mentions notify people who can read the notebook' })
  @ApiJsonBody(createCommentThreadRequestSchema)
  create(@CurrentUser() user: User, @Param('notebookId', notebookParam) notebookId: string, @Body(new ZodValidationPipe(createCommentThreadRequestSchema)) body: CreateThreadBody) {
    return this.comments.create(user, notebookId, body);
  }

  @Post(':threadId/replies')
  @ApiOperation({ summary: 'Reply in a thread (lead author, co-authors, reviewers)' })
  @ApiJsonBody(createCommentReplyRequestSchema)
  reply(
    @CurrentUser() user: User,
    @Param('notebookId', notebookParam) notebookId: string,
    @Param('threadId', threadParam) threadId: string,
    @Body(new ZodValidationPipe(createCommentReplyRequestSchema)) body: CreateReplyBody,
  ) {
    return this.comments.reply(user, notebookId, threadId, body);
  }

  @Post(':threadId/resolve')
  @HttpCode(200)
  @ApiOperation({ summary: 'Mark a thread resolved, recording who and when' })
  resolve(@CurrentUser() user: User, @Param('notebookId', notebookParam) notebookId: string, @Param('threadId', threadParam) threadId: string) {
    return this.comments.resolve(user, notebookId, threadId);
  }

  @Post(':threadId/reopen')
  @HttpCode(200)
  @ApiOperation({ summary: 'Reopen a resolved thread' })
  reopen(@CurrentUser() user: User, @Param('notebookId', notebookParam) notebookId: string, @Param('threadId', threadParam) threadId: string) {
    return this.comments.reopen(user, notebookId, threadId);
  }

  @Delete(':threadId')
  @HttpCode(204)
  @ApiOperation({ summary: 'Delete a thread and its replies (its author or the lead author)' })
  removeThread(@CurrentUser() user: User, @Param('notebookId', notebookParam) notebookId: string, @Param('threadId', threadParam) threadId: string) {
    return this.comments.removeThread(user, notebookId, threadId);
  }

  @Delete(':threadId/replies/:replyId')
  @HttpCode(204)
  @ApiOperation({ summary: 'Delete a reply (its author or the lead author)' })
  removeReply(
    @CurrentUser() user: User,
    @Param('notebookId', notebookParam) notebookId: string,
    @Param('threadId', threadParam) threadId: string,
    @Param('replyId', uuidParam('replyId')) replyId: string,
  ) {
    return this.comments.removeReply(user, notebookId, threadId, replyId);
  }
}
