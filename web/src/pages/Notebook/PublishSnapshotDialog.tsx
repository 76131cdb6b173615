import { Button, Dialog, Flex, Text, TextArea, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { SNAPSHOT_LIMITS, type SnapshotView } from '@upwell/common';
import { usePublishSnapshot } from '../../api/snapshots';
import { ErrorNote } from '../../components/ErrorNote';

/**
 * Publishes the notebook as it stands as the next numbered snapshot (lead
 * author), after saying plainly what "frozen" means.
 */
export function PublishSnapshotDialog({ notebookId, nextNumber, onPublished }: { notebookId: string; nextNumber: number; onPublished: (s: SnapshotView) => void }) {
  const publish = usePublishSnapshot(notebookId);
  const [open, setOpen] = useState(false);
  const [title, setTitle] = useState('');
  const [releaseNote, setReleaseNote] = useState('');

  async function submit(e: FormEvent) {
    e.preventDefault();
    await publish.mutateAsync({ title, releaseNote }).then(
      (snapshot) => {
        setOpen(false);
        setTitle('');
        setReleaseNote('');
        onPublished(snapshot);
      },
      () => {},
    );
  }

  return (
    <Dialog.Root
      open={open}
      onOpenChange={(o) => {
        setOpen(o);
        if (!o) publish.reset();
      }}
    >
      <Dialog.Trigger>
        <Button>Publish snapshot</Button>
      </Dialog.Trigger>
      <Dialog.Content maxWidth="560px">
        <Dialog.Title>Publish snapshot v{nextNumber}</Dialog.Title>
        <Dialog.Description size="2" mb="3">
          A snapshot freezes the notebook as it is now: its text, every figure and every live number, each with the exact data versions it
          was computed from. It never changes afterwards, even when the series get new versions. Everyone with a role on the notebook can
          read it, and you can share it by link.
        </Dialog.Description>
        <form onSubmit={submit} aria-label="Publish a snapshot">
          <Flex direction="column" gap="3">
            <label>
              <Text as="div" size="2" weight="bold" mb="1">
                Snapshot title
              </Text>
              <TextField.Root required maxLength={SNAPSHOT_LIMITS.titleMax} placeholder="e.g. Draft for co-authors" value={title} onChange={(e) => setTitle(e.target.value)} />
            </label>
            <label>
              <Text as="div" size="2" weight="bold" mb="1">
                Release note (optional)
              </Text>
              <TextArea
                maxLength={SNAPSHOT_LIMITS.releaseNoteMax}
                rows={4}
                placeholder="What changed since the last snapshot, what readers should look at"
                value={releaseNote}
                onChange={(e) => setReleaseNote(e.target.value)}
              />
            </label>
            <ErrorNote error={publish.error} action="Nothing was published; try again." />
            <Flex gap="2" justify="end">
              <Dialog.Close>
                <Button type="button" variant="soft" color="gray">
                  Cancel
                </Button>
              </Dialog.Close>
              <Button type="submit" loading={publish.isPending}>
                Publish v{nextNumber}
              </Button>
            </Flex>
          </Flex>
        </form>
      </Dialog.Content>
    </Dialog.Root>
  );
}
