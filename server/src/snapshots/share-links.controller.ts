import { Body, Controller, Delete, Get, HttpCode, Param, Post, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import { createShareLinkRequestSchema } from '@upwell/common';
import type { Response } from 'express';
import { CurrentUser } from '../auth/current-user.decorator';
import { Public } from '../auth/public.decorator';
import { ApiJsonBody } from '../common/api-docs';
import { uuidParam } from '../common/ids';
import { ZodValidationPipe } from '../common/zod-validation.pipe';
import { User } from '../users/user.entity';
import { sendSnapshotHtml } from './send-html';
import { ShareLinksService } from './share-links.service';

/** The lead author's public links to a snapshot. */
@ApiTags('snapshots')
@ApiBearerAuth()
@Controller('snapshots/:snapshotId/share-links')
export class ShareLinksController {
  constructor(private readonly links: ShareLinksService) {}

  @Post()
  @ApiOperation({ summary: 'Create a public link to the snapshot, optionally expiring (lead author); the token is shown only in this answer' })
  @ApiJsonBody(createShareLinkRequestSchema)
  create(
    @CurrentUser() user: User,
    @Param('snapshotId', uuidParam('snapshotId')) snapshotId: string,
    @Body(new ZodValidationPipe(createShareLinkRequestSchema)) body: { expiresAt: string | null },
  ) {
    return this.links.create(user, snapshotId, body.expiresAt);
  }

  @Get()
  @ApiOperation({ summary: 'The snapshot’s share links with their state (lead author)' })
  list(@CurrentUser() user: User, @Param('snapshotId', uuidParam('snapshotId')) snapshotId: string) {
    return this.links.list(user, snapshotId);
  }

  @Delete(':linkId')
  @HttpCode(204)
  @ApiOperation({ summary: 'Revoke a share link; it stays listed as revoked (lead author)' })
  async revoke(
    @CurrentUser() user: User,
    @Param('snapshotId', uuidParam('snapshotId')) snapshotId: string,
    @Param('linkId', uuidParam('linkId')) linkId: string,
  ): Promise<void> {
    await this.links.revoke(user, snapshotId, linkId);
  }
}

/** A shared snapshot for anyone holding its link, without signing in. */
@ApiTags('snapshots')
@Public()
@Controller('shared/:token')
export class SharedSnapshotsController {
  constructor(private readonly links: ShareLinksService) {}

  @Get()
  @ApiOperation({ summary: 'The shared snapshot (public); 404 for an unknown token, 410 once revoked or expired' })
  async get(@Param('token') token: string, @Res() res: Response): Promise<void> {
    res.status(200).type('application/json').send(await this.links.sharedJson(token));
  }

  @Get('html')
  @ApiOperation({ summary: 'The shared snapshot as its HTML file (public); 404/410 likewise' })
  async html(@Param('token') token: string, @Res() res: Response): Promise<void> {
    sendSnapshotHtml(res, await this.links.sharedHtml(token));
  }
}
