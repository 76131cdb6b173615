import { Button, Flex, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { LIMITS } from '@upwell/common';
import { useCreateGroup } from '../api/groups';
import { useCurrentGroup } from '../current-group';
import { ErrorNote } from './ErrorNote';

/** Starts a research group; the person becomes its admin and works in it. */
export function CreateGroupForm() {
  const create = useCreateGroup();
  const { choose } = useCurrentGroup();
  const [name, setName] = useState('');
  async function submit(e: FormEvent) {
    e.preventDefault();
    await create.mutateAsync({ name }).then((g) => {
      choose(g.id);
      setName('');
    }, () => {});
  }
  return (
    <form onSubmit={submit} aria-label="Create a research group">
      <Flex gap="2" align="start" direction="column">
        <Flex gap="2">
          <TextField.Root
            aria-label="Group name"
            placeholder="e.g. Tropical carbon dynamics group"
            required
            maxLength={LIMITS.groupNameMax}
            value={name}
            onChange={(e) => setName(e.target.value)}
            style={{ minWidth: 320 }}
          />
          <Button type="submit" loading={create.isPending}>
            Create group
          </Button>
        </Flex>
        <ErrorNote error={create.error} />
      </Flex>
    </form>
  );
}
