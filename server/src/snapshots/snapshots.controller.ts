import { Body, Controller, Get, Param, Post, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import { compareSnapshotQuerySchema, publishSnapshotRequestSchema, type CompareSnapshotQuery } from '@upwell/common';
import type { Response } from 'express';
import { CurrentUser } from '../auth/current-user.decorator';
import { ApiJsonBody, ApiQueryFrom } from '../common/api-docs';
import { uuidParam } from '../common/ids';
import { ZodValidationPipe } from '../common/zod-validation.pipe';
import { User } from '../users/user.entity';
import { sendSnapshotHtml } from './send-html';
import { SnapshotsService } from './snapshots.service';

/** Publishing and listing a notebook's snapshots. */
@ApiTags('snapshots')
@ApiBearerAuth()
@Controller('notebooks/:notebookId/snapshots')
export class NotebookSnapshotsController {
  constructor(private readonly snapshots: SnapshotsService) {}

  @Post()
  @ApiOperation({
    summary: 'Publish the notebook as a read-only snapshot (lead author)',
    description: 'Freezes the document and every live figure and number now, in one transaction. A snapshot can never be edited: there is no route for it.',
  })
  @ApiJsonBody(publishSnapshotRequestSchema)
  async publish(
    @CurrentUser() user: User,
    @Param('notebookId', uuidParam('notebookId')) notebookId: string,
    @Body(new ZodValidationPipe(publishSnapshotRequestSchema)) body: { title: string; releaseNote: string },
    @Res() res: Response,
  ): Promise<void> {
    res.status(201).type('application/json').send(await this.snapshots.publish(user, notebookId, body));
  }

  @Get()
  @ApiOperation({ summary: 'The notebook’s snapshots, newest first (anyone with a role on the notebook)' })
  list(@CurrentUser() user: User, @Param('notebookId', uuidParam('notebookId')) notebookId: string) {
    return this.snapshots.list(user, notebookId);
  }
}

/** Reading one snapshot: as JSON, as an HTML file, or compared. Nothing here changes it. */
@ApiTags('snapshots')
@ApiBearerAuth()
@Controller('snapshots/:snapshotId')
export class SnapshotsController {
  constructor(private readonly snapshots: SnapshotsService) {}

  @Get()
  @ApiOperation({ summary: 'A snapshot with its frozen content, byte for byte as published (anyone with a role on its notebook)' })
  async get(@CurrentUser() user: User, @Param('snapshotId', uuidParam('snapshotId')) snapshotId: string, @Res() res: Response): Promise<void> {
    // The stored payload is sent as its own bytes, never serialized again.
    res.status(200).type('application/json').send(await this.snapshots.json(user, snapshotId));
  }

  @Get('html')
  @ApiOperation({ summary: 'The snapshot as one self-contained HTML file (no script, fonts and figures inline)' })
  async html(@CurrentUser() user: User, @Param('snapshotId', uuidParam('snapshotId')) snapshotId: string, @Res() res: Response): Promise<void> {
    sendSnapshotHtml(res, await this.snapshots.html(user, snapshotId));
  }

  @Get('compare')
  @ApiOperation({ summary: 'What changed from this snapshot to another of the same notebook, or to the live notebook (with=live)' })
  @ApiQueryFrom(compareSnapshotQuerySchema)
  compare(
    @CurrentUser() user: User,
    @Param('snapshotId', uuidParam('snapshotId')) snapshotId: string,
    @Query(new ZodValidationPipe(compareSnapshotQuerySchema)) query: CompareSnapshotQuery,
  ) {
    return this.snapshots.compare(user, snapshotId, query.with);
  }
}
