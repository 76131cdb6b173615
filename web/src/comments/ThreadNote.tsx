import { Button, Flex, Text, VisuallyHidden } from '@radix-ui/themes';
import { useState } from 'react';
import type { CommentAnchor, CommentThreadView } from '@upwell/common';
import { ErrorNote } from '../components/ErrorNote';
import { formatWhen } from '../components/dates';
import { MentionTextArea } from './MentionTextArea';
import { mentionsIn, type Mentionable } from './mentions';

/** What a note can ask the panel to do; each returns when the server has answered. */
export interface ThreadNoteActions {
  reply: (threadId: string, body: string, mentions: string[]) => Promise<unknown>;
  resolve: (threadId: string) => Promise<unknown>;
  reopen: (threadId: string) => Promise<unknown>;
  removeThread: (threadId: string) => Promise<unknown>;
  removeReply: (threadId: string, replyId: string) => Promise<unknown>;
}

/** Props of ThreadNote. */
export interface ThreadNoteProps {
  thread: CommentThreadView;
  canComment: boolean;
  members: readonly Mentionable[];
  actions: ThreadNoteActions;
  onSelectAnchor?: (anchor: CommentAnchor, thread: CommentThreadView) => void;
}

/** Who wrote something and when, as a manuscript note's byline. */
function Byline({ name, at }: { name: string; at: string }) {
  return (
    <Text as="p" size="1" color="gray" className="upwell-note-byline">
      <strong>{name}</strong> · <time dateTime={at}>{formatWhen(at)}</time>
    </Text>
  );
}

/**
 * One numbered review note: the passage it discusses, the first comment,
 * the replies in order, and (for people who may comment) reply, resolve or reopen.
 */
export function ThreadNote({ thread, canComment, members, actions, onSelectAnchor }: ThreadNoteProps) {
  const [reply, setReply] = useState('');
  const [error, setError] = useState<unknown>(null);
  const [busy, setBusy] = useState(false);
  const n = thread.number;
  const run = async (work: () => Promise<unknown>, after?: () => void) => {
    setBusy(true);
    setError(null);
    try {
      await work();
      after?.();
    } catch (e) {
      setError(e);
    } finally {
      setBusy(false);
    }
  };
  const sendReply = () => {
    if (!reply.trim() || busy) return;
    void run(() => actions.reply(thread.id, reply.trim(), mentionsIn(reply, members)), () => setReply(''));
  };
  const quote = thread.anchor.quote ?? (thread.anchor.type === 'figure' ? 'a figure' : '');

  return (
    <article className="upwell-note" data-resolved={thread.resolved ? 'true' : 'false'} aria-labelledby={`note-${thread.id}-title`}>
      <header className="upwell-note-head">
        <span className="upwell-note-number" id={`note-${thread.id}-title`}>
          <VisuallyHidden>Note </VisuallyHidden>
          {n}
        </span>
        {onSelectAnchor && thread.anchorFound ? (
          <button type="button" className="upwell-note-quote" onClick={() => onSelectAnchor(thread.anchor, thread)} aria-label={`Show the passage of note ${n}`}>
            <q>{quote}</q>
          </button>
        ) : (
          <span className="upwell-note-quote">
            <q>{quote}</q>
            {!thread.anchorFound && <Text size="1" color="gray"> (no longer in the text)</Text>}
          </span>
        )}
      </header>
      <Byline name={thread.author.name} at={thread.createdAt} />
      <p className="upwell-note-body">{thread.body}</p>
      {thread.replies.length > 0 && (
        <ol className="upwell-note-replies" aria-label={`Replies to note ${n}`}>
          {thread.replies.map((r) => (
            <li key={r.id}>
              <Byline name={r.author.name} at={r.createdAt} />
              <p className="upwell-note-body">{r.body}</p>
              {r.canDelete && (
                <Button size="1" variant="ghost" color="gray" disabled={busy} onClick={() => void run(() => actions.removeReply(thread.id, r.id))} aria-label={`Delete reply by ${r.author.name}`}>
                  Delete
                </Button>
              )}
            </li>
          ))}
        </ol>
      )}
      {thread.resolved && (
        <Text as="p" size="1" className="upwell-note-status">
          Resolved by {thread.resolved.by.name}, <time dateTime={thread.resolved.at}>{formatWhen(thread.resolved.at)}</time>
        </Text>
      )}
      {error ? <ErrorNote error={error} action="Try again." /> : null}
      {canComment && !thread.resolved && (
        <form
          onSubmit={(e) => {
            e.preventDefault();
            sendReply();
          }}
        >
          <MentionTextArea label={`Reply to note ${n}`} value={reply} onChange={setReply} members={members} onSubmit={sendReply} />
          <Flex gap="2" justify="end" mt="1">
            <Button type="submit" size="1" disabled={!reply.trim() || busy}>
              Reply
            </Button>
          </Flex>
        </form>
      )}
      <Flex gap="2" mt="1" justify="end">
        {canComment &&
          (thread.resolved ? (
            <Button size="1" variant="soft" disabled={busy} onClick={() => void run(() => actions.reopen(thread.id))}>
              Reopen
            </Button>
          ) : (
            <Button size="1" variant="soft" disabled={busy} onClick={() => void run(() => actions.resolve(thread.id))}>
              Resolve
            </Button>
          ))}
        {thread.canDelete && (
          <Button size="1" variant="ghost" color="red" disabled={busy} onClick={() => void run(() => actions.removeThread(thread.id))} aria-label={`Delete note ${n}`}>
            Delete
          </Button>
        )}
      </Flex>
    </article>
  );
}
