import { Button, Callout, Flex, Heading, Text } from '@radix-ui/themes';
import { useState, type ReactNode } from 'react';
import type { SnapshotView as Snapshot } from '@upwell/common';
import { downloadSnapshotHtml, type SnapshotSource } from '../api/snapshots';
import { ErrorNote } from '../components/ErrorNote';
import { formatWhen } from '../components/dates';
import { FrozenDocument } from './FrozenDocument';
import { shaPrefix } from './provenance';
import '../editor/editor.css';
import './snapshot.css';

/** "outgassing-during-warm-events-v2.html": what to call the file if the server does not say. */
function fallbackFileName(s: Snapshot): string {
  const slug = s.notebookTitle.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'snapshot';
  return `${slug}-v${s.number}.html`;
}

/**
 * A published snapshot, read-only, as a journal page: notebook and snapshot
 * title, release note, who published it when, what "frozen" means, then the
 * document with its frozen figures and numbers. Downloading gives the same
 * page as one HTML file; printing gives a clean PDF (snapshot.css).
 */
export function SnapshotView({ snapshot, source, actions }: { snapshot: Snapshot; source: SnapshotSource; actions?: ReactNode }) {
  const [downloading, setDownloading] = useState(false);
  const [downloadError, setDownloadError] = useState<unknown>(null);
  const download = async () => {
    setDownloading(true);
    setDownloadError(null);
    try {
      await downloadSnapshotHtml(source, fallbackFileName(snapshot));
    } catch (e) {
      setDownloadError(e);
    } finally {
      setDownloading(false);
    }
  };
  const by = snapshot.publishedBy?.name ?? 'a former member';
  return (
    <article className="upwell-snapshot" aria-labelledby="snapshot-title">
      <header className="upwell-snapshot-head">
        <Text as="p" size="2" color="gray" className="upwell-snapshot-notebook">
          {snapshot.notebookTitle} · {snapshot.groupName}
        </Text>
        <Heading as="h1" size="6" id="snapshot-title" className="upwell-snapshot-title">
          Snapshot v{snapshot.number} — {snapshot.title}
        </Heading>
        <Text as="p" size="2" className="upwell-snapshot-meta">
          Published {formatWhen(snapshot.publishedAt)} by {by}
        </Text>
        {snapshot.releaseNote && (
          <section className="upwell-release-note" aria-labelledby="release-note-heading">
            <h2 id="release-note-heading">Release note</h2>
            <p>{snapshot.releaseNote}</p>
          </section>
        )}
        <p className="upwell-snapshot-frozen">
          A frozen snapshot: its text, {snapshot.figureCount === 1 ? 'figure' : `${snapshot.figureCount} figures`} and{' '}
          {snapshot.numberCount === 1 ? 'live number' : `${snapshot.numberCount} live numbers`} are as they were computed when it was published, from the data
          versions named under each figure, and do not follow newer data. Engine {snapshot.engineVersion}; content sha256{' '}
          <span className="upwell-mono">{shaPrefix(snapshot.contentSha256, 16)}…</span>
        </p>
        <Flex gap="2" wrap="wrap" align="center" className="upwell-snapshot-actions">
          <Button onClick={download} loading={downloading}>
            Download HTML
          </Button>
          <Button variant="soft" onClick={() => window.print()}>
            Print or save as PDF
          </Button>
          {actions}
        </Flex>
        {downloadError != null && <ErrorNote error={downloadError} action="Try again in a moment." />}
      </header>
      <div className="upwell-sheet upwell-snapshot-sheet">
        <FrozenDocument content={snapshot} />
      </div>
    </article>
  );
}

/** Why a snapshot cannot be shown, in words for the reader, with what to try. */
export function SnapshotUnavailable({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Flex direction="column" gap="3" className="upwell-snapshot-unavailable" role="alert">
      <Heading as="h1" size="5">
        {title}
      </Heading>
      <Callout.Root color="gray" size="1">
        <Callout.Text>{children}</Callout.Text>
      </Callout.Root>
    </Flex>
  );
}
