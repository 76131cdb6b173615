import { Body, Controller, Get, Param, Post, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import { notebookFileSchema, type NotebookFile } from '@upwell/common';
import type { Response } from 'express';
import { CurrentUser } from '../auth/current-user.decorator';
import { ApiJsonBody } from '../common/api-docs';
import { uuidParam } from '../common/ids';
import { ZodValidationPipe } from '../common/zod-validation.pipe';
import { User } from '../users/user.entity';
import { NotebookFilesService } from './notebook-files.service';

@ApiTags('notebooks')
@ApiBearerAuth()
@Controller()
export class NotebookFilesController {
  constructor(private readonly files: NotebookFilesService) {}

  @Get('notebooks/:notebookId/export')
  @ApiOperation({ summary: 'The notebook as an Upwell notebook file (<slug>.upwell.json), its bindings named (anyone with a role)' })
  async export(@CurrentUser() user: User, @Param('notebookId', uuidParam('notebookId')) notebookId: string, @Res() res: Response) {
    const { file, fileName } = await this.files.export(user, notebookId);
    res.status(200).type('application/json').attachment(fileName).send(JSON.stringify(file, null, 2) + '\n');
  }

  @Post('groups/:groupId/notebooks/import')
  @ApiOperation({
    summary: 'Create a notebook from an Upwell notebook file; its series are found by exact name in the group, and the importer becomes lead author',
    description: 'Answers 201 with the new notebook, or 400 naming every series or field the group does not hold (nothing is created).',
  })
  @ApiJsonBody(notebookFileSchema)
  import(
    @CurrentUser() user: User,
    @Param('groupId', uuidParam('groupId')) groupId: string,
    @Body(new ZodValidationPipe(notebookFileSchema)) body: NotebookFile,
  ) {
    return this.files.import(user, groupId, body);
  }
}
