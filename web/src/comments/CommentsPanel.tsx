import { Flex, Heading, Spinner, Switch, Text } from '@radix-ui/themes';
import { useId, useMemo, useState } from 'react';
import type { CommentAnchor, CommentThreadView } from '@upwell/common';
import { useGroup } from '../api/groups';
import { ErrorNote } from '../components/ErrorNote';
import { useCommentActions, useCommentsLive, useCommentThreads } from './api';
import { CommentComposer } from './CommentComposer';
import { ThreadNote, type ThreadNoteActions } from './ThreadNote';
import './comments.css';

/** Props of CommentsPanel. */
export interface CommentsPanelProps {
  notebookId: string;
  /** The notebook's group: its members are the people one can @-mention. */
  groupId: string;
  /** Whether the person may write notes (lead author, co-authors, reviewers); readers only read them. */
  canComment: boolean;
  /** The anchor of the editor's current selection (see useCommentAnchorFromSelection); the composer ties a new note to it. */
  anchor?: CommentAnchor | null;
  /** Called when a note's quoted passage is chosen, to select or scroll to it (see anchorToRange). */
  onSelectAnchor?: (anchor: CommentAnchor, thread: CommentThreadView) => void;
}

/**
 * The review notes of a notebook beside its text: numbered as the document
 * reads, open ones listed, resolved ones behind a switch, and a composer for
 * people who may comment. Kept live over the socket.
 */
export function CommentsPanel({ notebookId, groupId, canComment, anchor = null, onSelectAnchor }: CommentsPanelProps) {
  const threads = useCommentThreads(notebookId);
  const group = useGroup(groupId);
  const act = useCommentActions(notebookId);
  useCommentsLive(notebookId);
  const [showResolved, setShowResolved] = useState(false);
  const switchId = useId();
  const members = useMemo(() => (group.data?.members ?? []).map((m) => ({ id: m.user.id, name: m.user.name })), [group.data]);
  const actions: ThreadNoteActions = {
    reply: (threadId, body, mentions) => act.reply.mutateAsync({ threadId, body, mentions }),
    resolve: (threadId) => act.resolve.mutateAsync(threadId),
    reopen: (threadId) => act.reopen.mutateAsync(threadId),
    removeThread: (threadId) => act.removeThread.mutateAsync(threadId),
    removeReply: (threadId, replyId) => act.removeReply.mutateAsync({ threadId, replyId }),
  };
  const all = threads.data?.threads ?? [];
  const open = all.filter((t) => !t.resolved);
  const resolved = all.filter((t) => t.resolved);
  const shown = showResolved ? [...open, ...resolved] : open;

  return (
    <aside className="upwell-notes" aria-label="Review notes">
      <Flex align="baseline" justify="between" gap="3" wrap="wrap">
        <Heading as="h2" size="3">
          Review notes
        </Heading>
        <Text as="label" size="2" htmlFor={switchId}>
          <Flex gap="2" align="center">
            <Switch id={switchId} size="1" checked={showResolved} onCheckedChange={setShowResolved} aria-label={`Show resolved notes (${resolved.length})`} />
            Resolved ({resolved.length})
          </Flex>
        </Text>
      </Flex>
      {canComment && (
        <CommentComposer anchor={anchor} members={members} onSend={(body) => act.create.mutateAsync(body)} />
      )}
      {threads.isPending ? (
        <Spinner />
      ) : threads.error ? (
        <ErrorNote error={threads.error} action="Reload the page to try again." />
      ) : shown.length === 0 ? (
        <Text as="p" size="2" color="gray">
          {all.length === 0
            ? canComment
              ? 'No notes yet. Select a passage or a figure and write the first one.'
              : 'No notes yet. Reviewers and authors will leave theirs here.'
            : 'Every note is resolved. Turn on “Resolved” to read them.'}
        </Text>
      ) : (
        <ol className="upwell-notes-list" aria-label="Notes">
          {shown.map((t) => (
            <li key={t.id}>
              <ThreadNote thread={t} canComment={canComment} members={members} actions={actions} onSelectAnchor={onSelectAnchor} />
            </li>
          ))}
        </ol>
      )}
    </aside>
  );
}
