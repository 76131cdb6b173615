import type { SnapshotView } from '@upwell/common';
import { describe, expect, it } from 'vitest';
import { snapshotFileName, snapshotHtml } from './snapshot-html';

const hostile = '<script>alert(1)</script><img src=x onerror=alert(2)>';
const snapshot: SnapshotView = {
  id: 's', notebookId: 'n', number: 3, title: hostile, releaseNote: hostile, publishedAt: '2026-01-02T03:04:05.000Z',
  publishedBy: { id: 'u', name: 'A. Author', email: 'a@example.org' }, engineVersion: '1', editorSchemaVersion: 1,
  figureCount: 1, numberCount: 1, contentSha256: 'f'.repeat(64), notebookTitle: 'Notebook', groupId: 'g', groupName: 'Group',
  document: {
    type: 'doc',
    content: [
      { type: 'paragraph', content: [{ type: 'text', text: 'x', marks: [{ type: 'link', attrs: { href: 'javascript:alert(3)' } }] }, { type: 'liveNumber', attrs: { key: 'k', precision: 2 } }] },
      { type: 'liveFigure', attrs: { id: 'f', caption: hostile } },
    ],
  },
  figures: [{ figureId: 'f', ordinal: 1, caption: hostile, recipe: null, result: null, error: hostile }],
  numbers: [{ ordinal: 1, recipe: null, key: 'k', precision: 2, figureId: null, value: null, units: null, text: hostile, error: 'x' }],
};

describe('snapshotHtml()', () => {
  it('renders every hostile string inert: no script, no handler attribute, no javascript: URL', async () => {
    const html = await snapshotHtml(snapshot);
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toMatch(/<[^>]+\son[a-z]+\s*=/i);
    expect(html).not.toMatch(/javascript:/i);
    expect(html).not.toMatch(/<img/i); // the broken figure has no picture; the hostile img is text
    expect(html).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
  });
});

describe('snapshotFileName()', () => {
  it('slugs the notebook title and appends the snapshot number', () => {
    expect(snapshotFileName('Niño 3.4: the 1997 “warm” event', 2)).toBe('nino-3-4-the-1997-warm-event-v2.html');
    expect(snapshotFileName('***', 1)).toBe('notebook-v1.html');
  });
});
