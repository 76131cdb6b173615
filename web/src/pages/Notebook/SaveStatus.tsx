import { Text } from '@radix-ui/themes';
import type { SaveStatus as Status } from '../../sync/use-notebook-document';

const WORDS: Record<Status, string> = {
  loading: 'Opening the document…',
  saved: 'All changes saved',
  saving: 'Saving…',
  offline: 'Offline: your edits are kept on this device and sent when the connection returns',
  refused: 'Not saved',
  'read-only': 'Read only',
};

/** Where the document stands with the server, in words. */
export function SaveStatusLine({ status, error }: { status: Status; error: string | null }) {
  return (
    <Text size="2" color={status === 'refused' ? 'red' : status === 'offline' ? 'amber' : 'gray'} role="status" aria-live="polite">
      {WORDS[status]}
      {status === 'refused' && error ? `: ${error}` : ''}
    </Text>
  );
}
