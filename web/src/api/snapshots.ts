import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from './client';
import { downloadFile } from './download';
import type {
  CreateShareLinkRequest,
  PublishSnapshotRequest,
  ShareLinkCreated,
  ShareLinkList,
  SnapshotComparison,
  SnapshotList,
  SnapshotView,
} from '@upwell/common';

/** Query keys of snapshots. A snapshot never changes, so its own entries never go stale. */
export const snapshotKeys = {
  list: (notebookId: string) => ['snapshots', notebookId] as const,
  detail: (snapshotId: string) => ['snapshot', snapshotId] as const,
  shared: (token: string) => ['shared-snapshot', token] as const,
  links: (snapshotId: string) => ['snapshot', snapshotId, 'share-links'] as const,
  compare: (fromId: string, to: string) => ['snapshot', fromId, 'compare', to] as const,
};

/** The notebook's published snapshots, newest first (every notebook role). */
export function useSnapshots(notebookId: string) {
  return useQuery({
    queryKey: snapshotKeys.list(notebookId),
    queryFn: ({ signal }) => api<SnapshotList>(`/notebooks/${notebookId}/snapshots`, { signal }),
    select: (d) => d.snapshots,
  });
}

/** One frozen snapshot, for a person with a role on its notebook. */
export function useSnapshot(snapshotId: string) {
  return useQuery({
    queryKey: snapshotKeys.detail(snapshotId),
    queryFn: ({ signal }) => api<SnapshotView>(`/snapshots/${snapshotId}`, { signal }),
    staleTime: Infinity,
  });
}

/** A snapshot opened through a share link, without signing in (404 unknown link, 410 revoked or expired). */
export function useSharedSnapshot(token: string) {
  return useQuery({
    queryKey: snapshotKeys.shared(token),
    queryFn: ({ signal }) => api<SnapshotView>(`/shared/${encodeURIComponent(token)}`, { signal }),
    // A link's answer is final for this visit; asking again cannot turn 404 or 410 into a snapshot.
    retry: false,
  });
}

/** Publishes the notebook as it stands now as the next snapshot (lead author). */
export function usePublishSnapshot(notebookId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: PublishSnapshotRequest) => api<SnapshotView>(`/notebooks/${notebookId}/snapshots`, { method: 'POST', body }),
    onSuccess: (snapshot) => {
      qc.setQueryData(snapshotKeys.detail(snapshot.id), snapshot);
      return qc.invalidateQueries({ queryKey: snapshotKeys.list(notebookId) });
    },
  });
}

/** A snapshot's share links, and making and revoking them (lead author). */
export function useShareLinks(snapshotId: string, options: { enabled?: boolean } = {}) {
  const qc = useQueryClient();
  const key = snapshotKeys.links(snapshotId);
  return {
    list: useQuery({
      queryKey: key,
      queryFn: ({ signal }) => api<ShareLinkList>(`/snapshots/${snapshotId}/share-links`, { signal }),
      select: (d) => d.links,
      enabled: options.enabled ?? true,
    }),
    create: useMutation({
      mutationFn: (body: CreateShareLinkRequest) => api<ShareLinkCreated>(`/snapshots/${snapshotId}/share-links`, { method: 'POST', body }),
      onSuccess: () => qc.invalidateQueries({ queryKey: key }),
    }),
    revoke: useMutation({
      mutationFn: (linkId: string) => api<void>(`/snapshots/${snapshotId}/share-links/${linkId}`, { method: 'DELETE' }),
      onSuccess: () => qc.invalidateQueries({ queryKey: key }),
    }),
  };
}

/** What changed from one snapshot to another of the same notebook, or to the live notebook (`to` = 'live'). */
export function useSnapshotComparison(fromId: string | null, to: string | null) {
  return useQuery({
    queryKey: snapshotKeys.compare(fromId ?? '', to ?? ''),
    queryFn: ({ signal }) => api<SnapshotComparison>(`/snapshots/${fromId}/compare?with=${encodeURIComponent(to ?? '')}`, { signal }),
    enabled: !!fromId && !!to,
    // Against the live notebook the answer moves with every edit; between two snapshots it never does.
    staleTime: to === 'live' ? 0 : Infinity,
  });
}

/** Where a snapshot's self-contained HTML file is served: signed in by id, or public by share token. */
export type SnapshotSource = { kind: 'snapshot'; snapshotId: string } | { kind: 'shared'; token: string };

/** Downloads the snapshot as one self-contained HTML file (opens offline, no script). */
export function downloadSnapshotHtml(source: SnapshotSource, fallbackName: string): Promise<void> {
  const path = source.kind === 'snapshot' ? `/snapshots/${source.snapshotId}/html` : `/shared/${encodeURIComponent(source.token)}/html`;
  return downloadFile(path, fallbackName);
}
