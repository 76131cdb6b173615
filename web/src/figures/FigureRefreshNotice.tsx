import { Button, Callout, Flex } from '@radix-ui/themes';
import { describeRefresh, useFigureLiveRefresh } from '../api/figures';

/**
 * Keeps the notebook's figures following new series versions, and says so:
 * "DIC 0–100 m has a new version (v3); 2 figures and 1 number updated".
 * Mount once on the notebook page.
 */
export function FigureRefreshNotice({ notebookId }: { notebookId: string }) {
  const { notice, dismiss } = useFigureLiveRefresh(notebookId);
  if (!notice) return null;
  return (
    <Callout.Root size="1" color="teal" role="status" className="upwell-refresh-notice">
      <Flex align="center" gap="3" justify="between">
        <Callout.Text>{describeRefresh(notice)}.</Callout.Text>
        <Button size="1" variant="ghost" onClick={dismiss} aria-label="Dismiss the update notice">
          Dismiss
        </Button>
      </Flex>
    </Callout.Root>
  );
}
