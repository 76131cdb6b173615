import { Theme } from '@radix-ui/themes';
import { fireEvent, render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { SnapshotComparison } from '@upwell/common';
import { used } from '../../figures/test-data';
import { diffParagraphs, formatChange } from './compare-format';
import { CompareView } from './CompareView';

const comparison: SnapshotComparison = {
  from: { kind: 'snapshot', id: 's1', number: 1, title: 'Draft for co-authors', publishedAt: '2026-11-20T10:00:00Z' },
  to: { kind: 'snapshot', id: 's2', number: 2, title: 'Sent to reviewers', publishedAt: '2026-12-01T18:40:00Z' },
  text: [
    { op: 'equal', text: 'Outgassing during the warm events\n\nThe flux answers the index ' },
    { op: 'delete', text: 'three' },
    { op: 'insert', text: 'seven' },
    { op: 'equal', text: ' months later.\n\nMethods follow Bretherton et al. 1999.' },
    { op: 'insert', text: '\n\nA new closing paragraph.' },
  ],
  figures: [
    {
      figureId: 'f1',
      ordinalBefore: 1,
      ordinalAfter: 1,
      status: 'changed',
      captionBefore: 'Lagged correlation.',
      captionAfter: 'Lagged correlation of flux on the index.',
      recipeChanged: false,
      seriesBefore: [used({ name: 'Air–sea flux', version: 1 })],
      seriesAfter: [used({ name: 'Air–sea flux', version: 2 })],
      values: [{ key: 'strongest.lag', label: 'lag of strongest correlation', units: 'months', before: 3, after: 7 }],
    },
    {
      figureId: 'f2',
      ordinalBefore: null,
      ordinalAfter: 2,
      status: 'added',
      captionBefore: null,
      captionAfter: 'Event table.',
      recipeChanged: false,
      seriesBefore: [],
      seriesAfter: [used()],
      values: [],
    },
  ],
  numbers: [
    { ordinalBefore: 1, ordinalAfter: 1, key: 'strongest.lag', status: 'changed', textBefore: '3 months', textAfter: '7 months', before: 3, after: 7, units: 'months' },
    { ordinalBefore: 2, ordinalAfter: null, key: 'strongest.r', status: 'removed', textBefore: '−0.62', textAfter: null, before: -0.62, after: null, units: '' },
  ],
};

const renderView = () =>
  render(
    <Theme>
      <CompareView comparison={comparison} />
    </Theme>,
  );

describe('CompareView', () => {
  it('marks inserted and deleted words by underline and strike-through, and names them for screen readers', () => {
    renderView();
    const diff = screen.getByLabelText('Text changes');
    const ins = [...diff.querySelectorAll('ins')].map((e) => e.textContent);
    const del = [...diff.querySelectorAll('del')].map((e) => e.textContent);
    // <ins>/<del> carry the meaning in HTML (WHATWG HTML §4.7 edits); the hidden labels say it aloud.
    expect(ins).toEqual(['[inserted: seven]', '[inserted: A new closing paragraph.]']);
    expect(del).toEqual(['[deleted: three]']);
    expect(diff.querySelectorAll('p')).toHaveLength(4);
    expect(screen.getByText(/words inserted/).textContent).toContain('5 words inserted, 1 word deleted');
    // Only the changed paragraphs, on request.
    fireEvent.click(screen.getByLabelText('Only paragraphs with changes'));
    expect([...diff.querySelectorAll('p')].map((p) => p.textContent)).toEqual([
      'The flux answers the index [deleted: three][inserted: seven] months later.',
      '[inserted: A new closing paragraph.]',
    ]);
  });

  it('shows each figure and live number before and after, with the change in words and numbers', () => {
    renderView();
    const f1 = screen.getByRole('group', { name: 'Figure 1' });
    expect(f1.textContent).toContain('Changed');
    expect(f1.textContent).toContain('Air–sea flux v1 → Air–sea flux v2');
    const values = within(f1).getByRole('table', { name: 'Values of Figure 1' });
    const row = within(values).getByRole('row', { name: /lag of strongest correlation/ });
    expect([...row.querySelectorAll('td')].map((td) => td.textContent)).toEqual(['3\u00a0months', '7\u00a0months', '+4\u00a0months']);
    expect(screen.getByRole('group', { name: 'Figure 2 (new)' }).textContent).toContain('Added');

    const numbers = screen.getByRole('table', { name: 'Live numbers before and after' });
    const lag = within(numbers).getByRole('row', { name: /Number 1/ });
    expect([...lag.querySelectorAll('td')].map((td) => td.textContent)).toEqual(['3 months', '7 months', '+4\u00a0months', 'Changed']);
    const r = within(numbers).getByRole('row', { name: /Number 2 \(removed\)/ });
    expect([...r.querySelectorAll('td')].map((td) => td.textContent)).toEqual(['−0.62', '—', '—', 'Removed']);
    expect(screen.getByText(/From/).textContent).toContain('Snapshot v1 — Draft for co-authors');
  });
});

describe('compare-format', () => {
  it('signs a change with a true minus sign (U+2212, as typeset) and says "no change" for equal values', () => {
    expect(formatChange(0.5, 0.38, 'Pg C')).toBe('\u22120.12\u00a0Pg C');
    expect(formatChange(1, 1)).toBe('no change');
    expect(formatChange(null, 2)).toBe('—');
  });

  it('splits the diff into paragraphs at the "\\n\\n" block separators of the contract', () => {
    expect(diffParagraphs([{ op: 'equal', text: 'a\n\nb ' }, { op: 'insert', text: 'c' }])).toEqual([[{ op: 'equal', text: 'a' }], [{ op: 'equal', text: 'b ' }, { op: 'insert', text: 'c' }]]);
  });
});
