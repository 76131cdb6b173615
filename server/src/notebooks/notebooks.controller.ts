import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Put, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import {
  assignNotebookRoleRequestSchema,
  createNotebookRequestSchema,
  listNotebooksQuerySchema,
  updateNotebookRequestSchema,
  type AssignNotebookRoleRequest,
  type CreateNotebookRequest,
  type ListNotebooksQuery,
  type UpdateNotebookRequest,
} from '@upwell/common';
import { CurrentUser } from '../auth/current-user.decorator';
import { ApiJsonBody, ApiQueryFrom } from '../common/api-docs';
import { uuidParam } from '../common/ids';
import { ZodValidationPipe } from '../common/zod-validation.pipe';
import { User } from '../users/user.entity';
import { NotebooksService } from './notebooks.service';

@ApiTags('notebooks')
@ApiBearerAuth()
@Controller()
export class NotebooksController {
  constructor(private readonly notebooks: NotebooksService) {}

  @Get('groups/:groupId/notebooks')
  @ApiOperation({ summary: 'Notebooks of a group that the signed-in person holds a role on' })
  @ApiQueryFrom(listNotebooksQuerySchema)
  list(
    @CurrentUser() user: User,
    @Param('groupId', uuidParam('groupId')) groupId: string,
    @Query(new ZodValidationPipe(listNotebooksQuerySchema)) query: ListNotebooksQuery,
  ) {
    return this.notebooks.list(user, groupId, query);
  }

  @Post('groups/:groupId/notebooks')
  @ApiOperation({ summary: 'Create a notebook in a group; its creator becomes lead author' })
  @ApiJsonBody(createNotebookRequestSchema)
  create(
    @CurrentUser() user: User,
    @Param('groupId', uuidParam('groupId')) groupId: string,
    @Body(new ZodValidationPipe(createNotebookRequestSchema)) body: CreateNotebookRequest,
  ) {
    return this.notebooks.create(user, groupId, body);
  }

  @Get('notebooks/:notebookId')
  @ApiOperation({ summary: 'One notebook, with the reader’s role on it' })
  get(@CurrentUser() user: User, @Param('notebookId', uuidParam('notebookId')) notebookId: string) {
    return this.notebooks.get(user, notebookId);
  }

  @Post('notebooks/:notebookId/duplicate')
  @ApiOperation({ summary: 'Copy a notebook’s document into a new notebook you lead (lead author)' })
  duplicate(@CurrentUser() user: User, @Param('notebookId', uuidParam('notebookId')) notebookId: string) {
    return this.notebooks.duplicate(user, notebookId);
  }

  @Patch('notebooks/:notebookId')
  @ApiOperation({ summary: 'Rename, describe, archive or restore a notebook (lead author)' })
  @ApiJsonBody(updateNotebookRequestSchema)
  update(
    @CurrentUser() user: User,
    @Param('notebookId', uuidParam('notebookId')) notebookId: string,
    @Body(new ZodValidationPipe(updateNotebookRequestSchema)) body: UpdateNotebookRequest,
  ) {
    return this.notebooks.update(user, notebookId, body);
  }

  @Delete('notebooks/:notebookId')
  @HttpCode(204)
  @ApiOperation({ summary: 'Delete a notebook (lead author)' })
  remove(@CurrentUser() user: User, @Param('notebookId', uuidParam('notebookId')) notebookId: string) {
    return this.notebooks.remove(user, notebookId);
  }

  @Get('notebooks/:notebookId/roles')
  @ApiOperation({ summary: 'Who holds which role on a notebook' })
  roles(@CurrentUser() user: User, @Param('notebookId', uuidParam('notebookId')) notebookId: string) {
    return this.notebooks.roles(user, notebookId);
  }

  @Put('notebooks/:notebookId/roles/:userId')
  @ApiOperation({ summary: 'Give a group member a role on the notebook (lead author)' })
  @ApiJsonBody(assignNotebookRoleRequestSchema)
  assignRole(
    @CurrentUser() user: User,
    @Param('notebookId', uuidParam('notebookId')) notebookId: string,
    @Param('userId', uuidParam('userId')) userId: string,
    @Body(new ZodValidationPipe(assignNotebookRoleRequestSchema)) body: AssignNotebookRoleRequest,
  ) {
    return this.notebooks.assignRole(user, notebookId, userId, body);
  }

  @Delete('notebooks/:notebookId/roles/:userId')
  @HttpCode(204)
  @ApiOperation({ summary: 'Take a person’s role on the notebook away (lead author)' })
  removeRole(
    @CurrentUser() user: User,
    @Param('notebookId', uuidParam('notebookId')) notebookId: string,
    @Param('userId', uuidParam('userId')) userId: string,
  ) {
    return this.notebooks.removeRole(user, notebookId, userId);
  }
}
