import { Button, Flex, Text } from '@radix-ui/themes';
import { useState } from 'react';
import type { CommentAnchor } from '@upwell/common';
import { ErrorNote } from '../components/ErrorNote';
import { MentionTextArea } from './MentionTextArea';
import { mentionsIn, type Mentionable } from './mentions';

/** Props of CommentComposer. */
export interface CommentComposerProps {
  /** What the new note will be tied to: the current selection, or null when nothing is selected. */
  anchor: CommentAnchor | null;
  members: readonly Mentionable[];
  onSend: (body: { anchor: CommentAnchor; body: string; mentions: string[] }) => Promise<unknown>;
}

/** Where a new note is written: it shows the passage or figure it will be tied to, then takes the text. */
export function CommentComposer({ anchor, members, onSend }: CommentComposerProps) {
  const [body, setBody] = useState('');
  const [error, setError] = useState<unknown>(null);
  const [busy, setBusy] = useState(false);
  const send = async () => {
    if (!anchor || !body.trim() || busy) return;
    setBusy(true);
    setError(null);
    try {
      await onSend({ anchor, body: body.trim(), mentions: mentionsIn(body, members) });
      setBody('');
    } catch (e) {
      setError(e);
    } finally {
      setBusy(false);
    }
  };
  return (
    <form
      className="upwell-note-composer"
      aria-label="New note"
      onSubmit={(e) => {
        e.preventDefault();
        void send();
      }}
    >
      {anchor ? (
        <Text as="p" size="2" className="upwell-note-target">
          {anchor.type === 'figure' ? 'On the selected figure' : 'On'} {anchor.quote ? <q>{anchor.quote}</q> : null}
        </Text>
      ) : (
        <Text as="p" size="2" color="gray">
          Select a passage or a figure in the notebook, then write your note about it here.
        </Text>
      )}
      <MentionTextArea label="Comment" value={body} onChange={setBody} members={members} onSubmit={send} placeholder="Type @ to mention someone" />
      {error ? <ErrorNote error={error} action="Check the note and try again." /> : null}
      <Flex justify="end" mt="2">
        <Button type="submit" disabled={!anchor || !body.trim() || busy}>
          Add comment
        </Button>
      </Flex>
    </form>
  );
}
