import { Module } from '@nestjs/common';
import { AuthModule } from '../auth/auth.module';
import { CollaborationModule } from '../collaboration/collaboration.module';
import { GroupsModule } from '../groups/groups.module';
import { NotebookAccessModule } from '../notebooks/notebook-access.module';
import { InvitationPolicy } from './invitation.policy';
import { InvitationThrottlerGuard } from './invitation-throttler.guard';
import { InvitationsController } from './invitations.controller';
import { InvitationsService } from './invitations.service';

/** Invitations by e-mail to a group role or a notebook role, with single-use expiring links. */
@Module({
  imports: [AuthModule, GroupsModule, NotebookAccessModule, CollaborationModule],
  controllers: [InvitationsController],
  providers: [InvitationsService, InvitationPolicy, InvitationThrottlerGuard],
})
export class InvitationsModule {}
