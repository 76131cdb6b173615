import { Button, Flex, Heading, Spinner, Text } from '@radix-ui/themes';
import { Link, useParams, useSearchParams } from 'react-router';
import { useNotebook } from '../../api/notebooks';
import { useSnapshotComparison, useSnapshots } from '../../api/snapshots';
import { ErrorNote } from '../../components/ErrorNote';
import { CompareChooser } from './CompareChooser';
import { CompareView } from './CompareView';

/** /notebooks/:notebookId/compare?from=<snapshotId>&to=<snapshotId|live>: what changed between two versions of a notebook. */
export default function ComparePage() {
  const { notebookId = '' } = useParams();
  const [params, setParams] = useSearchParams();
  const from = params.get('from');
  const to = params.get('to') ?? 'live';
  const notebook = useNotebook(notebookId);
  const snapshots = useSnapshots(notebookId);
  const comparison = useSnapshotComparison(from, to);
  return (
    <Flex direction="column" gap="4">
      <Flex justify="between" align="center" wrap="wrap" gap="2">
        <div>
          <Text as="p" size="2" color="gray">
            {notebook.data?.title ?? ' '}
          </Text>
          <Heading as="h1" size="6">
            Compare versions
          </Heading>
        </div>
        <Button asChild variant="ghost">
          <Link to={`/notebooks/${notebookId}`}>Back to the notebook</Link>
        </Button>
      </Flex>
      <ErrorNote error={notebook.error ?? snapshots.error} action="Go back to the notebook." />
      {snapshots.data && snapshots.data.length === 0 && (
        <Text size="2" color="gray">
          This notebook has no snapshots yet. Its lead author publishes one from the notebook’s Snapshots tab.
        </Text>
      )}
      {snapshots.data && (
        <CompareChooser key={`${from}|${to}`} snapshots={snapshots.data} from={from} to={to} onCompare={(f, t) => setParams({ from: f, to: t })} />
      )}
      {!from ? (
        snapshots.data?.length ? <Text size="2">Choose a snapshot to compare.</Text> : null
      ) : comparison.error ? (
        <ErrorNote error={comparison.error} action="Choose another pair of versions." />
      ) : !comparison.data ? (
        <Flex gap="2" align="center" role="status">
          <Spinner /> Comparing…
        </Flex>
      ) : (
        <CompareView comparison={comparison.data} />
      )}
    </Flex>
  );
}
