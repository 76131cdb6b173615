import { Text } from '@radix-ui/themes';
import type { LiveStatus as Status } from '../../sync/socket-document-provider';

const WORDS: Record<Status, string> = {
  connecting: 'Connecting…',
  closed: 'Closed',
  saved: 'All changes saved',
  saving: 'Saving…',
  offline: 'Offline: your edits are kept on this device and merged when the connection returns',
  refused: 'Not saved',
  'read-only': 'Read only',
};

/** Where the document stands with the server, in words. */
export function SaveStatusLine({ status, error }: { status: Status; error: string | null }) {
  return (
    <Text size="2" color={status === 'refused' || status === 'closed' ? 'red' : status === 'offline' ? 'amber' : 'gray'} role="status" aria-live="polite">
      {WORDS[status]}
      {(status === 'refused' || status === 'closed') && error ? `: ${error}` : ''}
    </Text>
  );
}
