import { NOTEBOOK_ACTIONS, notebookRoleAllows, type NotebookRole, type NotebookRoleView, type NotebookView } from '@upwell/common';
import { presentUser } from '../users/user.presenter';
import type { Notebook, NotebookRoleAssignment } from './notebook.entity';

/** A notebook as its reader sees it, with what their role lets them do. */
export function presentNotebook(notebook: Notebook, myRole: NotebookRole): NotebookView {
  return {
    id: notebook.id,
    groupId: notebook.group.id,
    title: notebook.title,
    description: notebook.description,
    owner: presentUser(notebook.owner),
    createdAt: notebook.createdAt.toISOString(),
    updatedAt: notebook.updatedAt.toISOString(),
    archived: notebook.archivedAt !== null,
    myRole,
    allowed: NOTEBOOK_ACTIONS.filter((a) => notebookRoleAllows(myRole, a)),
  };
}

/** One entry of a notebook's access list. */
export function presentNotebookRole(a: NotebookRoleAssignment): NotebookRoleView {
  return { user: presentUser(a.user), role: a.role };
}
