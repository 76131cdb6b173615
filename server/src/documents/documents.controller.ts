import { Body, Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import { documentUpdateRequestSchema, type DocumentUpdateRequest } from '@upwell/common';
import { CurrentUser } from '../auth/current-user.decorator';
import { ApiJsonBody } from '../common/api-docs';
import { uuidParam } from '../common/ids';
import { ZodValidationPipe } from '../common/zod-validation.pipe';
import { User } from '../users/user.entity';
import { DocumentsService } from './documents.service';

@ApiTags('documents')
@ApiBearerAuth()
@Controller('notebooks/:notebookId/document')
export class DocumentsController {
  constructor(private readonly documents: DocumentsService) {}

  @Get()
  @ApiOperation({ summary: 'The notebook’s document as one Yjs update (base64)' })
  state(@CurrentUser() user: User, @Param('notebookId', uuidParam('notebookId')) notebookId: string) {
    return this.documents.state(user, notebookId);
  }

  @Post('updates')
  @HttpCode(200)
  @ApiOperation({ summary: 'Store one Yjs update of the document (lead author and co-authors); answered once it is on disk' })
  @ApiJsonBody(documentUpdateRequestSchema)
  update(
    @CurrentUser() user: User,
    @Param('notebookId', uuidParam('notebookId')) notebookId: string,
    @Body(new ZodValidationPipe(documentUpdateRequestSchema)) body: DocumentUpdateRequest,
  ) {
    return this.documents.applyFromHttp(user, notebookId, body.update);
  }
}
