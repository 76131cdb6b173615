import { Button, Dialog, Flex, Text, TextArea, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router';
import { LIMITS } from '@upwell/common';
import { useCreateNotebook } from '../../api/notebooks';
import { ErrorNote } from '../../components/ErrorNote';

/** Starts a notebook in the current group, with the person as lead author. */
export function NewNotebookDialog({ groupId }: { groupId: string }) {
  const create = useCreateNotebook(groupId);
  const navigate = useNavigate();
  const [open, setOpen] = useState(false);
  const [title, setTitle] = useState('');
  const [description, setDescription] = useState('');

  async function submit(e: FormEvent) {
    e.preventDefault();
    await create.mutateAsync({ title, description }).then((nb) => {
      setOpen(false);
      navigate(`/notebooks/${nb.id}`);
    }, () => {});
  }

  return (
    <Dialog.Root open={open} onOpenChange={setOpen}>
      <Dialog.Trigger>
        <Button size="3">New notebook</Button>
      </Dialog.Trigger>
      <Dialog.Content maxWidth="520px">
        <Dialog.Title>New notebook</Dialog.Title>
        <Dialog.Description size="2" color="gray" mb="4">
          One notebook holds one analysis: its text, figures and live numbers. You will be its lead author.
        </Dialog.Description>
        <form onSubmit={submit}>
          <Flex direction="column" gap="3">
            <label>
              <Text as="div" size="2" weight="bold" mb="1">
                Title
              </Text>
              <TextField.Root required maxLength={LIMITS.notebookTitleMax} value={title} onChange={(e) => setTitle(e.target.value)} />
            </label>
            <label>
              <Text as="div" size="2" weight="bold" mb="1">
                Description (optional)
              </Text>
              <TextArea maxLength={LIMITS.notebookDescriptionMax} value={description} onChange={(e) => setDescription(e.target.value)} />
            </label>
            <ErrorNote error={create.error} />
            <Flex gap="2" justify="end">
              <Dialog.Close>
                <Button type="button" variant="soft" color="gray">
                  Cancel
                </Button>
              </Dialog.Close>
              <Button type="submit" loading={create.isPending}>
                Create notebook
              </Button>
            </Flex>
          </Flex>
        </form>
      </Dialog.Content>
    </Dialog.Root>
  );
}
