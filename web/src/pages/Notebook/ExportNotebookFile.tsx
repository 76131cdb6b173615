import { Button, Flex, Text } from '@radix-ui/themes';
import type { NotebookView } from '@upwell/common';
import { useExportNotebookFile } from '../../api/notebook-files';
import { ErrorNote } from '../../components/ErrorNote';

/** "Export notebook file": the document with its bindings named, to import into another group or keep. */
export function ExportNotebookFile({ notebook }: { notebook: NotebookView }) {
  const exportFile = useExportNotebookFile(notebook.id);
  return (
    <Flex direction="column" gap="2" mb="4">
      <Flex gap="3" align="center" wrap="wrap">
        <Button variant="soft" onClick={() => exportFile.mutate()} loading={exportFile.isPending}>
          Export notebook file
        </Button>
        <Text size="2" color="gray">
          The document and its figures, with series named so another group holding series of the same names can import it.
        </Text>
      </Flex>
      <ErrorNote error={exportFile.error} />
    </Flex>
  );
}
