import { AlertDialog, Badge, Box, Button, Callout, Flex, Heading, Spinner, Text } from '@radix-ui/themes';
import { useNavigate, useParams } from 'react-router';
import { NOTEBOOK_ROLE_LABELS } from '@upwell/common';
import { useDeleteNotebook, useNotebook, useUpdateNotebook } from '../../api/notebooks';
import { ErrorNote } from '../../components/ErrorNote';
import { formatWhen } from '../../components/dates';
import { AccessList } from './AccessList';

/** One notebook: its title page and the people on it. */
export default function NotebookPage() {
  const { notebookId = '' } = useParams();
  const notebook = useNotebook(notebookId);
  const update = useUpdateNotebook(notebookId);
  const remove = useDeleteNotebook(notebookId);
  const navigate = useNavigate();

  if (notebook.error) return <ErrorNote error={notebook.error} action="Go back to the notebooks list." />;
  if (!notebook.data) return <Spinner size="3" />;
  const nb = notebook.data;
  const lead = nb.allowed.includes('delete');

  return (
    <Flex direction="column" gap="5">
      <Box className="upwell-sheet" p="6">
        <Flex justify="between" align="start" gap="4" wrap="wrap">
          <div>
            <Heading as="h1" size="7" mb="2">
              {nb.title}
            </Heading>
            {nb.description && (
              <Text as="p" className="upwell-prose" mb="2">
                {nb.description}
              </Text>
            )}
            <Text as="p" size="2" color="gray">
              Lead author {nb.owner.name} · started {formatWhen(nb.createdAt)} · last edit {formatWhen(nb.updatedAt)}
            </Text>
          </div>
          <Flex gap="2" align="center">
            <Badge size="2" variant="soft">
              You: {NOTEBOOK_ROLE_LABELS[nb.myRole]}
            </Badge>
            {nb.archived && <Badge color="gray">Archived</Badge>}
          </Flex>
        </Flex>
        <Callout.Root mt="4" color="gray" variant="surface">
          <Callout.Text>
            The manuscript editor with live figures and numbers is not part of this version yet; this page manages the notebook and
            who works on it.
          </Callout.Text>
        </Callout.Root>
      </Box>
      <AccessList notebook={nb} />
      {lead && (
        <Flex gap="3">
          <Button variant="soft" onClick={() => update.mutate({ archived: !nb.archived })} loading={update.isPending}>
            {nb.archived ? 'Restore from archive' : 'Archive notebook'}
          </Button>
          <AlertDialog.Root>
            <AlertDialog.Trigger>
              <Button variant="soft" color="red">
                Delete notebook
              </Button>
            </AlertDialog.Trigger>
            <AlertDialog.Content maxWidth="440px">
              <AlertDialog.Title>Delete “{nb.title}”?</AlertDialog.Title>
              <AlertDialog.Description size="2">
                The notebook and everyone’s roles on it are removed for good. Archive it instead to keep it out of the way.
              </AlertDialog.Description>
              <Flex gap="3" mt="4" justify="end">
                <AlertDialog.Cancel>
                  <Button variant="soft" color="gray">
                    Keep it
                  </Button>
                </AlertDialog.Cancel>
                <AlertDialog.Action>
                  <Button color="red" onClick={() => remove.mutate(undefined, { onSuccess: () => navigate('/notebooks') })}>
                    Delete for good
                  </Button>
                </AlertDialog.Action>
              </Flex>
            </AlertDialog.Content>
          </AlertDialog.Root>
        </Flex>
      )}
      <ErrorNote error={update.error ?? remove.error} />
    </Flex>
  );
}
