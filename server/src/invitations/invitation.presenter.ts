import type { InvitationView } from '@upwell/common';
import { presentUser } from '../users/user.presenter';
import type { Invitation } from './invitation.entity';

/** A pending invitation as its group admin or lead author sees it; never the token or its hash. */
export function presentInvitation(i: Invitation): InvitationView {
  return {
    id: i.id,
    kind: i.kind,
    groupId: i.group.id,
    notebookId: i.notebook?.id ?? null,
    email: i.email,
    role: i.role,
    invitedBy: i.invitedBy ? presentUser(i.invitedBy) : null,
    createdAt: i.createdAt.toISOString(),
    expiresAt: i.expiresAt.toISOString(),
  };
}
