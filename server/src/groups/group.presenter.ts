import { GROUP_ACTIONS, groupRoleAllows, type GroupAction, type GroupDetail, type GroupRole, type GroupSummary } from '@upwell/common';
import { presentUser } from '../users/user.presenter';
import type { GroupMembership } from './group.entity';

/** What a group role allows, read from the permission matrix (the web offers actions from this, never from the role). */
export function allowedGroupActions(role: GroupRole): GroupAction[] {
  return GROUP_ACTIONS.filter((a) => groupRoleAllows(role, a));
}

/** A group in a person's list of groups. */
export function presentGroupSummary(m: GroupMembership): GroupSummary {
  return { id: m.group.id, name: m.group.name, role: m.role, allowed: allowedGroupActions(m.role) };
}

/** A group with its members, for the group page. */
export function presentGroupDetail(mine: GroupMembership, members: GroupMembership[]): GroupDetail {
  return {
    id: mine.group.id,
    name: mine.group.name,
    createdAt: mine.group.createdAt.toISOString(),
    role: mine.role,
    allowed: allowedGroupActions(mine.role),
    members: members.map((m) => ({ user: presentUser(m.user), role: m.role, since: m.createdAt.toISOString() })),
  };
}
