/**
 * Upwell's role model, shared by the server (which enforces it) and the web
 * client (which only uses it to decide what to offer).
 */

/** Roles a person can hold in a research group. */
export const GROUP_ROLES = ['admin', 'member'] as const;
export type GroupRole = (typeof GROUP_ROLES)[number];

/** Roles a person can hold on one notebook, strongest first. */
export const NOTEBOOK_ROLES = ['lead-author', 'co-author', 'reviewer', 'reader'] as const;
export type NotebookRole = (typeof NOTEBOOK_ROLES)[number];

/** Words shown to people for each notebook role. */
export const NOTEBOOK_ROLE_LABELS: Record<NotebookRole, string> = {
  'lead-author': 'Lead author',
  'co-author': 'Co-author',
  reviewer: 'Reviewer',
  reader: 'Reader',
};

/** Things a person may try to do with a notebook. */
export const NOTEBOOK_ACTIONS = [
  'read',
  'comment',
  'edit',
  'manage-access',
  'publish',
  'rename',
  'archive',
  'delete',
] as const;
export type NotebookAction = (typeof NOTEBOOK_ACTIONS)[number];

/**
 * The permission matrix: which notebook role may do what.
 * A reader reads; a reviewer reads and comments; a co-author also edits the
 * document and its figures; the lead author owns the notebook, manages who
 * has access, publishes snapshots, renames, archives and deletes.
 */
export const NOTEBOOK_PERMISSIONS: Record<NotebookRole, readonly NotebookAction[]> = {
  'lead-author': NOTEBOOK_ACTIONS,
  'co-author': ['read', 'comment', 'edit'],
  reviewer: ['read', 'comment'],
  reader: ['read'],
};

/** Whether a notebook role allows an action; no role allows nothing. */
export function notebookRoleAllows(role: NotebookRole | null | undefined, action: NotebookAction): boolean {
  return role != null && NOTEBOOK_PERMISSIONS[role].includes(action);
}

/** Things a person may try to do with a research group. */
export const GROUP_ACTIONS = ['view', 'create-notebook', 'manage-members', 'rename', 'delete-series', 'upload-series', 'read-mail'] as const;
export type GroupAction = (typeof GROUP_ACTIONS)[number];

/** Which group role may do what: members work in the group, admins also run it (and read the mail sent about it). */
export const GROUP_PERMISSIONS: Record<GroupRole, readonly GroupAction[]> = {
  admin: GROUP_ACTIONS,
  member: ['view', 'create-notebook', 'upload-series'],
};

/** Whether a group role allows an action; not being a member allows nothing. */
export function groupRoleAllows(role: GroupRole | null | undefined, action: GroupAction): boolean {
  return role != null && GROUP_PERMISSIONS[role].includes(action);
}
