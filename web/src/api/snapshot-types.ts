import type { FigureResult, UsedSeries, UserView } from '@upwell/common';

/*
 * TEMPORARY: the snapshot shapes of /work/contract-snapshots.md, until the
 * zod schemas land in common/src/api/snapshots.ts (then these re-export them).
 */
export interface SnapshotSummary {
  id: string;
  notebookId: string;
  number: number;
  title: string;
  releaseNote: string;
  publishedAt: string;
  publishedBy: UserView | null;
  engineVersion: string;
  editorSchemaVersion: number;
  figureCount: number;
  numberCount: number;
  contentSha256: string;
}
export interface FrozenFigure {
  figureId: string;
  ordinal: number;
  caption: string;
  recipe: Record<string, unknown>;
  result: FigureResult | null;
  error: string | null;
}
export interface FrozenNumber {
  ordinal: number;
  recipe: Record<string, unknown>;
  key: string;
  precision: number;
  figureId: string | null;
  value: number | null;
  units: string | null;
  text: string;
  error: string | null;
}
export interface Snapshot extends SnapshotSummary {
  notebookTitle: string;
  groupId: string;
  groupName: string;
  document: { type: 'doc'; content?: unknown[] } & Record<string, unknown>;
  figures: FrozenFigure[];
  numbers: FrozenNumber[];
}
export interface ShareLink {
  id: string;
  snapshotId: string;
  createdAt: string;
  createdBy: UserView | null;
  expiresAt: string | null;
  revokedAt: string | null;
  state: 'active' | 'expired' | 'revoked';
  tokenHint: string;
}
export interface ShareLinkCreated extends ShareLink {
  token: string;
  url: string;
}
export interface PublishSnapshotRequest {
  title: string;
  releaseNote?: string;
}
export interface CreateShareLinkRequest {
  expiresAt?: string | null;
}
type ChangeStatus = 'added' | 'removed' | 'changed' | 'unchanged';
export interface SnapshotComparison {
  from: { kind: 'snapshot'; id: string; number: number; title: string; publishedAt: string };
  to: { kind: 'snapshot'; id: string; number: number; title: string; publishedAt: string } | { kind: 'live'; at: string };
  text: { op: 'equal' | 'insert' | 'delete'; text: string }[];
  figures: {
    figureId: string;
    ordinalBefore: number | null;
    ordinalAfter: number | null;
    status: ChangeStatus;
    captionBefore: string | null;
    captionAfter: string | null;
    recipeChanged: boolean;
    seriesBefore: UsedSeries[];
    seriesAfter: UsedSeries[];
    values: { key: string; label: string; units: string; before: number | null; after: number | null }[];
  }[];
  numbers: {
    ordinalBefore: number | null;
    ordinalAfter: number | null;
    key: string;
    status: ChangeStatus;
    textBefore: string | null;
    textAfter: string | null;
    before: number | null;
    after: number | null;
    units: string | null;
  }[];
}
