import { Spinner, Text } from '@radix-ui/themes';
import { useParams } from 'react-router';
import { ApiError } from '../../api/client';
import { useSharedSnapshot } from '../../api/snapshots';
import { ErrorNote } from '../../components/ErrorNote';
import { SnapshotUnavailable, SnapshotView } from '../../snapshots/SnapshotView';

function Body({ token }: { token: string }) {
  const snapshot = useSharedSnapshot(token);
  const status = snapshot.error instanceof ApiError ? snapshot.error.status : null;
  if (status === 404) {
    return (
      <SnapshotUnavailable title="No such link">
        This share link does not lead to any snapshot. Check that the whole address was copied, or ask the person who sent it for a new link.
      </SnapshotUnavailable>
    );
  }
  if (status === 410) {
    return (
      <SnapshotUnavailable title="This link was revoked or has expired">
        The notebook’s lead author has withdrawn this share link, or its expiry date has passed. Ask them for a new link.
      </SnapshotUnavailable>
    );
  }
  if (snapshot.error) return <ErrorNote error={snapshot.error} action="Reload the page to try again." />;
  if (!snapshot.data) return <Spinner size="3" />;
  return <SnapshotView snapshot={snapshot.data} source={{ kind: 'shared', token }} />;
}

/** A snapshot opened through a share link: public, no sign-in, no app navigation. */
export default function SharedSnapshotPage() {
  const { token = '' } = useParams();
  return (
    <>
      <header className="upwell-public-masthead">
        <Text size="5" className="upwell-wordmark">
          Upwell
        </Text>
        <Text size="2" color="gray">
          Shared snapshot · read-only
        </Text>
      </header>
      <main className="upwell-public-main">
        <Body token={token} />
      </main>
    </>
  );
}
