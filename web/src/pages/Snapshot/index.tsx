import { Button, Spinner } from '@radix-ui/themes';
import { Link, useParams } from 'react-router';
import { useSnapshot } from '../../api/snapshots';
import { ApiError } from '../../api/client';
import { ErrorNote } from '../../components/ErrorNote';
import { SnapshotUnavailable, SnapshotView } from '../../snapshots/SnapshotView';

/** A published snapshot for a person with a role on its notebook: read-only, with download, print and compare. */
export default function SnapshotPage() {
  const { snapshotId = '' } = useParams();
  const snapshot = useSnapshot(snapshotId);
  if (snapshot.error instanceof ApiError && snapshot.error.status === 404) {
    return (
      <SnapshotUnavailable title="No such snapshot">
        This snapshot does not exist, or you hold no role on its notebook. Ask the notebook’s lead author for access or for a share link.
      </SnapshotUnavailable>
    );
  }
  if (snapshot.error) return <ErrorNote error={snapshot.error} action="Reload the page to try again." />;
  if (!snapshot.data) return <Spinner size="3" />;
  const s = snapshot.data;
  return (
    <SnapshotView
      snapshot={s}
      source={{ kind: 'snapshot', snapshotId: s.id }}
      actions={
        <>
          <Button asChild variant="soft" color="gray">
            <Link to={`/notebooks/${s.notebookId}/compare?from=${s.id}&to=live`}>Compare with the live notebook</Link>
          </Button>
          <Button asChild variant="ghost">
            <Link to={`/notebooks/${s.notebookId}`}>Back to the notebook</Link>
          </Button>
        </>
      }
    />
  );
}
