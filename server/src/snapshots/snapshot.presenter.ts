import type { ShareLinkView, SnapshotSummary } from '@upwell/common';
import { presentUser } from '../users/user.presenter';
import type { ShareLink, Snapshot } from './snapshot.entity';
import { shareLinkState } from './snapshot.policy';

/** A snapshot as listed (without its frozen content). */
export function presentSnapshotSummary(s: Snapshot): SnapshotSummary {
  return {
    id: s.id,
    notebookId: s.notebook.id,
    number: s.number,
    title: s.title,
    releaseNote: s.releaseNote,
    publishedAt: s.publishedAt.toISOString(),
    publishedBy: s.publishedBy ? presentUser(s.publishedBy) : null,
    engineVersion: s.engineVersion,
    editorSchemaVersion: s.editorSchemaVersion,
    figureCount: s.figureCount,
    numberCount: s.numberCount,
    contentSha256: s.contentSha256,
  };
}

/**
 * The whole snapshot as JSON text: its summary fields followed by the stored payload's own
 * bytes, never parsed and serialized again, so the body is the same every time.
 */
export function snapshotJson(s: Snapshot): string {
  const summary = JSON.stringify(presentSnapshotSummary(s));
  // Both are JSON objects ({…}); the payload's keys never repeat the summary's.
  return `${summary.slice(0, -1)},${s.payload.slice(1)}`;
}

/** A share link as its owner sees it. */
export function presentShareLink(link: ShareLink, now = new Date()): ShareLinkView {
  return {
    id: link.id,
    snapshotId: link.snapshot.id,
    createdAt: link.createdAt.toISOString(),
    createdBy: link.createdBy ? presentUser(link.createdBy) : null,
    expiresAt: link.expiresAt?.toISOString() ?? null,
    revokedAt: link.revokedAt?.toISOString() ?? null,
    state: shareLinkState(link, now),
    tokenHint: link.tokenHint,
  };
}
