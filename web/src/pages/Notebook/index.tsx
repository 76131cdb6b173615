import { Badge, Box, Flex, Grid, Heading, Spinner, Tabs, Text } from '@radix-ui/themes';
import type { Editor } from '@tiptap/react';
import { useState } from 'react';
import { CommentsPanel, anchorToRange, useCommentAnchorFromSelection } from '../../comments';
import { useParams } from 'react-router';
import { NOTEBOOK_ROLE_LABELS } from '@upwell/common';
import { useNotebook } from '../../api/notebooks';
import { ErrorNote } from '../../components/ErrorNote';
import { formatWhen } from '../../components/dates';
import { NotebookEditor } from '../../editor';
import { FigureRefreshNotice } from '../../figures/FigureRefreshNotice';
import { useSeriesLiveRefresh } from '../../realtime/socket';
import { useMe } from '../../api/auth';
import { presenceColour, useLiveNotebookDocument } from '../../sync/use-live-document';
import { PresenceRow } from './PresenceRow';
import { AccessList } from './AccessList';
import { CheckpointsPanel } from './CheckpointsPanel';
import { EventSetsPanel } from './EventSetsPanel';
import { NotebookSettings } from './NotebookSettings';
import { ExportNotebookFile } from './ExportNotebookFile';
import { SaveStatusLine } from './SaveStatus';
import { SnapshotsPanel } from './SnapshotsPanel';

/** One notebook: the manuscript with its live figures, and beneath it event sets, people and settings. */
export default function NotebookPage() {
  const { notebookId = '' } = useParams();
  const notebook = useNotebook(notebookId);
  if (notebook.error) return <ErrorNote error={notebook.error} action="Go back to the notebooks list." />;
  if (!notebook.data) return <Spinner size="3" />;
  return <NotebookWorkspace key={notebookId} notebook={notebook.data} />;
}

function NotebookWorkspace({ notebook }: { notebook: NonNullable<ReturnType<typeof useNotebook>['data']> }) {
  const editable = notebook.allowed.includes('edit');
  const me = useMe().data!;
  const { doc, provider, status, error, ready } = useLiveNotebookDocument(notebook.id, { id: me.id, name: me.name });
  const [editor, setEditor] = useState<Editor | null>(null);
  const anchor = useCommentAnchorFromSelection(editor);
  useSeriesLiveRefresh();

  return (
    <Flex direction="column" gap="4">
      <Flex justify="between" align="center" gap="3" wrap="wrap">
        <Flex gap="2" align="center" wrap="wrap">
          <Text size="2" color="gray">
            {notebook.title}
          </Text>
          <Badge variant="soft" color={notebook.myRole === 'lead-author' ? 'teal' : 'gray'}>
            {NOTEBOOK_ROLE_LABELS[notebook.myRole]}
          </Badge>
          {notebook.archived && <Badge color="gray">Archived</Badge>}
          <Text size="1" color="gray">
            Lead author {notebook.owner.name} · last edit {formatWhen(notebook.updatedAt)}
          </Text>
        </Flex>
        <Flex gap="4" align="center" wrap="wrap">
          <PresenceRow provider={provider} meId={me.id} />
          <SaveStatusLine status={status} error={error} />
        </Flex>
      </Flex>
      <FigureRefreshNotice notebookId={notebook.id} />
      <Grid columns={{ initial: '1', md: '1fr 320px' }} gap="4" align="start">
        <Box className="upwell-sheet upwell-manuscript" px={{ initial: '4', sm: '8' }} py="6">
          {ready && provider ? (
            <NotebookEditor
              key={notebook.id}
              notebookId={notebook.id}
              groupId={notebook.groupId}
              doc={doc}
              editable={editable && provider.canEdit}
              presence={{ provider, user: { id: me.id, name: me.name, color: presenceColour(me.id) } }}
              onReady={setEditor}
            />
          ) : (
            <Spinner />
          )}
        </Box>
        <Box asChild style={{ position: 'sticky', top: 16 }}>
          <aside aria-label="Review notes">
            <CommentsPanel
              notebookId={notebook.id}
              groupId={notebook.groupId}
              canComment={notebook.allowed.includes('comment')}
              anchor={anchor}
              onSelectAnchor={(a) => {
                const range = editor && anchorToRange(editor, a);
                if (editor && range) editor.chain().setTextSelection(range).scrollIntoView().run();
              }}
            />
          </aside>
        </Box>
      </Grid>
      <Tabs.Root defaultValue="events">
        <Tabs.List aria-label="About this notebook">
          <Tabs.Trigger value="events">Event sets</Tabs.Trigger>
          <Tabs.Trigger value="checkpoints">Checkpoints</Tabs.Trigger>
          <Tabs.Trigger value="snapshots">Snapshots</Tabs.Trigger>
          <Tabs.Trigger value="people">People</Tabs.Trigger>
          <Tabs.Trigger value="settings">Notebook</Tabs.Trigger>
        </Tabs.List>
        <Box pt="4">
          <Tabs.Content value="events">
            <EventSetsPanel notebookId={notebook.id} groupId={notebook.groupId} editable={editable} />
          </Tabs.Content>
          <Tabs.Content value="checkpoints">
            <CheckpointsPanel notebookId={notebook.id} editable={editable} />
          </Tabs.Content>
          <Tabs.Content value="snapshots">
            <SnapshotsPanel notebookId={notebook.id} canPublish={notebook.allowed.includes('publish')} />
          </Tabs.Content>
          <Tabs.Content value="people">
            <AccessList notebook={notebook} />
          </Tabs.Content>
          <Tabs.Content value="settings">
            <Heading as="h2" size="4" mb="2">
              This notebook
            </Heading>
            <ExportNotebookFile notebook={notebook} />
            <NotebookSettings notebook={notebook} />
          </Tabs.Content>
        </Box>
      </Tabs.Root>
    </Flex>
  );
}
