import type { Response } from 'express';
import { SNAPSHOT_CSP } from './html/snapshot-html';

/** Sends a snapshot file as a download, under the same CSP it carries inside. */
export function sendSnapshotHtml(res: Response, file: { html: string; fileName: string }): void {
  res
    .status(200)
    .type('text/html; charset=utf-8')
    .set('Content-Disposition', `attachment; filename="${file.fileName}"`)
    .set('Content-Security-Policy', SNAPSHOT_CSP)
    .send(file.html);
}
