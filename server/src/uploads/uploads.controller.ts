import { BadRequestException, Body, Controller, Delete, Get, HttpCode, Param, Post, UploadedFile, UseGuards, UseInterceptors } from '@nestjs/common';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiOperation, ApiTags } from '@nestjs/swagger';
import { FileInterceptor } from '@nestjs/platform-express';
import { csvImportOptionsSchema, importUploadRequestSchema, type CsvImportOptions, type ImportUploadBody } from '@upwell/common';
import { CurrentUser } from '../auth/current-user.decorator';
import { ApiJsonBody } from '../common/api-docs';
import { uuidParam } from '../common/ids';
import { describeIssues, ZodValidationPipe } from '../common/zod-validation.pipe';
import { User } from '../users/user.entity';
import { UploadGateGuard } from './upload-gate.guard';
import { UploadsService, type ReceivedFile } from './uploads.service';

/** The multipart `options` field: JSON of the CSV reading overrides, or absent. */
function parseOptions(raw: unknown): CsvImportOptions {
  if (raw === undefined || raw === '') return {};
  let value: unknown;
  try {
    value = JSON.parse(String(raw));
  } catch {
    throw new BadRequestException('the "options" field must be JSON, e.g. {"delimiter":"semicolon"}');
  }
  const parsed = csvImportOptionsSchema.safeParse(value);
  if (!parsed.success) throw new BadRequestException(`options: ${describeIssues(parsed.error).message}`);
  return parsed.data;
}

@ApiTags('uploads')
@ApiBearerAuth()
@Controller()
export class UploadsController {
  constructor(private readonly uploads: UploadsService) {}

  @Post('groups/:groupId/uploads')
  @ApiOperation({
    summary: 'Upload a CSV table or a NetCDF file; answers a preview of the series it holds (nothing is stored as series yet)',
  })
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file'],
      properties: { file: { type: 'string', format: 'binary' }, options: { type: 'string', description: 'JSON of CSV reading overrides' } },
    },
  })
  // The gate checks membership and quotas before the interceptor reads the body.
  @UseGuards(UploadGateGuard)
  @UseInterceptors(FileInterceptor('file'))
  stage(
    @CurrentUser() user: User,
    @Param('groupId', uuidParam('groupId')) groupId: string,
    @UploadedFile() file: ReceivedFile | undefined,
    @Body() body: Record<string, unknown>,
  ) {
    return this.uploads.stage(user, groupId, file, parseOptions(body?.options));
  }

  @Get('groups/:groupId/uploads')
  @ApiOperation({ summary: 'Staged uploads of the group (nothing imported yet, deleted when they expire) and your upload quota' })
  listStaged(@CurrentUser() user: User, @Param('groupId', uuidParam('groupId')) groupId: string) {
    return this.uploads.listStaged(user, groupId);
  }

  @Post('uploads/:uploadId/import')
  @HttpCode(200)
  @ApiOperation({ summary: 'Make series (or new versions of existing ones) from a staged upload, as mapped' })
  @ApiJsonBody(importUploadRequestSchema)
  import(
    @CurrentUser() user: User,
    @Param('uploadId', uuidParam('uploadId')) uploadId: string,
    @Body(new ZodValidationPipe(importUploadRequestSchema)) body: ImportUploadBody,
  ) {
    return this.uploads.import(user, uploadId, body);
  }

  @Delete('uploads/:uploadId')
  @HttpCode(204)
  @ApiOperation({ summary: 'Discard a staged upload that nothing was imported from' })
  discard(@CurrentUser() user: User, @Param('uploadId', uuidParam('uploadId')) uploadId: string) {
    return this.uploads.discard(user, uploadId);
  }
}
