import { Body, Controller, Delete, Get, Headers, HttpCode, Param, Post, UseGuards } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import { ThrottlerGuard } from '@nestjs/throttler';
import {
  acceptInvitationRequestSchema,
  createGroupInvitationRequestSchema,
  createNotebookInvitationRequestSchema,
  type AcceptInvitationRequest,
  type CreateGroupInvitationRequest,
  type CreateNotebookInvitationRequest,
} from '@upwell/common';
import { CurrentUser } from '../auth/current-user.decorator';
import { Public } from '../auth/public.decorator';
import { ApiJsonBody } from '../common/api-docs';
import { uuidParam } from '../common/ids';
import { ZodValidationPipe } from '../common/zod-validation.pipe';
import { User } from '../users/user.entity';
import { InvitationThrottlerGuard } from './invitation-throttler.guard';
import { InvitationsService } from './invitations.service';

/** The bearer token of an Authorization header, or null when there is none. */
function bearerOf(header: string | undefined): string | null {
  const m = /^Bearer\s+(\S+)$/i.exec(header ?? '');
  return m ? m[1] : null;
}

@ApiTags('invitations')
@Controller()
export class InvitationsController {
  constructor(private readonly invitations: InvitationsService) {}

  @Post('groups/:groupId/invitations')
  @UseGuards(InvitationThrottlerGuard)
  @ApiBearerAuth()
  @ApiOperation({ summary: 'Invite someone by e-mail to the group with a group role (group admins)', description: 'Answers the invitation with mailSent and mailError; 409 if they already hold the role; 429 past INVITATIONS_PER_HOUR.' })
  @ApiJsonBody(createGroupInvitationRequestSchema)
  inviteToGroup(
    @CurrentUser() user: User,
    @Param('groupId', uuidParam('groupId')) groupId: string,
    @Body(new ZodValidationPipe(createGroupInvitationRequestSchema)) body: CreateGroupInvitationRequest,
  ) {
    return this.invitations.create(user, { kind: 'group', groupId }, body);
  }

  @Get('groups/:groupId/invitations')
  @ApiBearerAuth()
  @ApiOperation({ summary: 'Pending invitations to the group (group admins); answers { invitations }' })
  listGroup(@CurrentUser() user: User, @Param('groupId', uuidParam('groupId')) groupId: string) {
    return this.invitations.listPending(user, { kind: 'group', groupId });
  }

  @Delete('groups/:groupId/invitations/:invitationId')
  @HttpCode(204)
  @ApiBearerAuth()
  @ApiOperation({ summary: 'Revoke an invitation to the group (group admins)' })
  revokeGroup(
    @CurrentUser() user: User,
    @Param('groupId', uuidParam('groupId')) groupId: string,
    @Param('invitationId', uuidParam('invitationId')) invitationId: string,
  ) {
    return this.invitations.revoke(user, { kind: 'group', groupId }, invitationId);
  }

  @Post('notebooks/:notebookId/invitations')
  @UseGuards(InvitationThrottlerGuard)
  @ApiBearerAuth()
  @ApiOperation({ summary: 'Invite someone by e-mail to the notebook with a notebook role (lead author); accepting also makes them a group member' })
  @ApiJsonBody(createNotebookInvitationRequestSchema)
  inviteToNotebook(
    @CurrentUser() user: User,
    @Param('notebookId', uuidParam('notebookId')) notebookId: string,
    @Body(new ZodValidationPipe(createNotebookInvitationRequestSchema)) body: CreateNotebookInvitationRequest,
  ) {
    return this.invitations.create(user, { kind: 'notebook', notebookId }, body);
  }

  @Get('notebooks/:notebookId/invitations')
  @ApiBearerAuth()
  @ApiOperation({ summary: 'Pending invitations to the notebook (lead author); answers { invitations }' })
  listNotebook(@CurrentUser() user: User, @Param('notebookId', uuidParam('notebookId')) notebookId: string) {
    return this.invitations.listPending(user, { kind: 'notebook', notebookId });
  }

  @Delete('notebooks/:notebookId/invitations/:invitationId')
  @HttpCode(204)
  @ApiBearerAuth()
  @ApiOperation({ summary: 'Revoke an invitation to the notebook (lead author)' })
  revokeNotebook(
    @CurrentUser() user: User,
    @Param('notebookId', uuidParam('notebookId')) notebookId: string,
    @Param('invitationId', uuidParam('invitationId')) invitationId: string,
  ) {
    return this.invitations.revoke(user, { kind: 'notebook', notebookId }, invitationId);
  }

  @Public()
  @Get('invitations/:token')
  @ApiOperation({ summary: 'What an invitation link offers (public); 404 unknown, 410 used, revoked or expired' })
  preview(@Param('token') token: string) {
    return this.invitations.preview(token);
  }

  @Public()
  // Accepting signs in or signs up, so it is throttled per client address as they are (AUTH_ATTEMPTS_PER_MINUTE).
  @UseGuards(ThrottlerGuard)
  @Post('invitations/:token/accept')
  @HttpCode(200)
  @ApiOperation({
    summary: 'Accept an invitation: signed in (bearer token), or with { name, password } to create the invited account, or { password } to sign in to it',
    description: 'Answers { accessToken, user, granted: { kind, groupId, notebookId, role } }. The account is always the invited address: signed in as anyone else → 403. 429 past AUTH_ATTEMPTS_PER_MINUTE.',
  })
  @ApiJsonBody(acceptInvitationRequestSchema)
  accept(
    @Param('token') token: string,
    @Headers('authorization') authorization: string | undefined,
    @Body(new ZodValidationPipe(acceptInvitationRequestSchema)) body: AcceptInvitationRequest,
  ) {
    return this.invitations.accept(token, body, bearerOf(authorization));
  }
}
