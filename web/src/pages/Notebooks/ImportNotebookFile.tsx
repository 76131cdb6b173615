import { Button, Callout, Flex, Text } from '@radix-ui/themes';
import { NOTEBOOK_FILE_EXTENSION } from '@upwell/common';
import { useRef } from 'react';
import { useNavigate } from 'react-router';
import { ApiError } from '../../api/client';
import { useImportNotebookFile } from '../../api/notebook-files';

/** "Import notebook file": a notebook file becomes a new notebook of the group, led by the person importing. */
export function ImportNotebookFile({ groupId }: { groupId: string }) {
  const input = useRef<HTMLInputElement>(null);
  const importFile = useImportNotebookFile(groupId);
  const navigate = useNavigate();
  const error = importFile.error;
  const issues = error instanceof ApiError ? error.issues.filter((i) => i.path.startsWith('series.') || i.path.startsWith('fields.')) : [];
  return (
    <Flex direction="column" gap="2" align="end">
      <input
        ref={input}
        type="file"
        accept={`${NOTEBOOK_FILE_EXTENSION},application/json`}
        aria-label="Notebook file to import"
        hidden
        onChange={(e) => {
          const file = e.target.files?.[0];
          e.target.value = '';
          if (file) importFile.mutate(file, { onSuccess: (nb) => navigate(`/notebooks/${nb.id}`) });
        }}
      />
      <Button size="3" variant="soft" loading={importFile.isPending} onClick={() => input.current?.click()}>
        Import notebook file
      </Button>
      {error && (
        <Callout.Root color="red" role="alert" size="1" style={{ maxWidth: 520 }}>
          <Callout.Text>
            {issues.length ? 'The notebook was not imported: this group lacks data the file binds.' : `The notebook was not imported: ${error.message}`}
          </Callout.Text>
          {issues.length > 0 && (
            <ul aria-label="Missing series" style={{ margin: 0, paddingLeft: '1.2em' }}>
              {issues.map((i) => (
                <li key={i.path}>
                  <Text size="2">{i.message}</Text>
                </li>
              ))}
            </ul>
          )}
          {issues.length > 0 && <Callout.Text size="1">Upload the series under exactly these names (or rename yours), then import again.</Callout.Text>}
        </Callout.Root>
      )}
    </Flex>
  );
}
