import { Theme } from '@radix-ui/themes';
import { render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { FrozenFigure, FrozenNumber } from '@upwell/common';
import { INDEX_ID, result, SERIES_ID, used } from '../figures/test-data';
import { FrozenDocument, type FrozenContent } from './FrozenDocument';

const FIGURE_ID = 'f-7d3e';
const recipe = {
  kind: 'event-table',
  index: { seriesId: INDEX_ID, version: 5 },
  carbon: [{ seriesId: SERIES_ID, version: 3 }],
};

const figure: FrozenFigure = {
  figureId: FIGURE_ID,
  ordinal: 1,
  caption: 'Carbon change over each warm and cold event.',
  recipe,
  result: result(
    'event-table',
    {
      carbonSeries: [{ seriesId: SERIES_ID, name: 'DIC 0–100 m', units: 'Pg C', treatment: 'inventory-difference' }],
      rows: [{ phase: 'warm', start: '1997-05', peak: '1997-12', end: '1998-05', months: 13, peakValue: 2.4, strength: 'very strong', label: '', carbon: { [SERIES_ID]: -0.4213 } }],
    },
    {
      methods: 'Events: 3-month running mean of the index above ±0.5 for at least 5 months; base period 1991-01 to 2020-12.',
      cautions: ['Model output, not observation.'],
      used: [used({ seriesId: INDEX_ID, name: 'Warm-pool index', version: 5, units: '°C', origin: 'observation', valuesSha256: 'c0ffee'.repeat(10) + 'abcd' }), used()],
      numbers: [{ key: 'warm.meanPgC', label: 'mean carbon change over warm events', value: -0.4213, units: 'Pg C' }],
    },
  ),
  error: null,
};

const number: FrozenNumber = {
  ordinal: 1,
  recipe,
  key: 'warm.meanPgC',
  precision: 2,
  figureId: FIGURE_ID,
  value: -0.4213,
  units: 'Pg C',
  text: '−0.42\u00a0Pg C',
  error: null,
};

const paragraph = (...content: unknown[]) => ({ type: 'paragraph', content });
const text = (t: string, marks?: unknown[]) => ({ type: 'text', text: t, ...(marks ? { marks } : {}) });

function snapshotOf(document: FrozenContent['document'], figures: FrozenFigure[] = [], numbers: FrozenNumber[] = []): FrozenContent {
  return { document, figures, numbers };
}

function renderFrozen(content: FrozenContent) {
  return render(
    <Theme>
      <FrozenDocument content={content} />
    </Theme>,
  );
}

afterEach(() => vi.unstubAllGlobals());

describe('FrozenDocument', () => {
  it('draws a live figure and a live number from the frozen data without any fetch', () => {
    const fetch = vi.fn(() => Promise.reject(new Error('a frozen snapshot must not fetch')));
    vi.stubGlobal('fetch', fetch);
    const doc = {
      type: 'doc',
      content: [
        { type: 'heading', attrs: { level: 1 }, content: [text('Outgassing during the warm events')] },
        paragraph(text('Over warm events the upper ocean lost '), { type: 'liveNumber', attrs: { recipe, key: 'warm.meanPgC', precision: 2, figureId: FIGURE_ID } }, text(' on average.')),
        { type: 'liveFigure', attrs: { id: FIGURE_ID, recipe, caption: 'Carbon change over each warm and cold event.' } },
      ],
    } as const;
    renderFrozen(snapshotOf(doc, [figure], [number]));

    expect(screen.getByRole('heading', { level: 1 }).textContent).toBe('Outgassing during the warm events');
    // The number reads exactly as it was frozen, and says where it came from.
    const p = screen.getByText(/upper ocean lost/);
    expect(p.textContent).toBe('Over warm events the upper ocean lost −0.42\u00a0Pg C on average.');
    expect(p.querySelector('[data-number-ordinal="1"]')!.getAttribute('title')).toContain('from Figure 1');

    const fig = screen.getByRole('figure', { name: 'Figure 1' });
    expect(fig.querySelector('figcaption')!.textContent).toBe('Figure 1. Carbon change over each warm and cold event.');
    // The stored result is drawn as the live figure draws it: the event table, true minus sign.
    expect(screen.getByRole('table', { name: 'Figure 1: Event table' }).textContent).toContain('−0.42');
    expect(fig.textContent).toContain('3-month running mean of the index');
    expect(fig.textContent).toContain('Caution: Model output, not observation.');
    // Provenance: names, versions, the sha256 prefix, and the parameters with versions resolved.
    const series = screen.getByRole('list', { name: 'Series used' });
    expect(series.textContent).toContain('Warm-pool index v5');
    expect(series.textContent).toContain('sha256 c0ffeec0ffee…');
    expect(series.textContent).toContain('DIC 0–100 m v3 · Pg C · model output');
    expect(fig.textContent).toContain('index: Warm-pool index v5; carbon: DIC 0–100 m v3');
    expect(fetch).not.toHaveBeenCalled();
  });

  it('says why a figure has no picture when it could not be computed at publishing', () => {
    const failed: FrozenFigure = { ...figure, caption: '', result: null, error: 'series 0a9b… has no version 9' };
    renderFrozen(snapshotOf({ type: 'doc', content: [{ type: 'liveFigure', attrs: { id: FIGURE_ID, recipe, caption: '' } }] }, [failed]));
    expect(screen.getByRole('note').textContent).toBe('This figure could not be computed when the snapshot was published: series 0a9b… has no version 9');
    expect(screen.getByRole('figure', { name: 'Figure 1' }).querySelector('figcaption')!.textContent).toBe('Figure 1. No caption.');
  });

  it('renders <script> text, a javascript: link and an <img onerror> attempt inert', () => {
    // The attacks are those of the OWASP XSS Filter Evasion Cheat Sheet (script tag, javascript: URL, img onerror).
    const w = window as unknown as { __pwned?: number };
    delete w.__pwned;
    const doc = {
      type: 'doc' as const,
      content: [
        paragraph(text('<script>window.__pwned = 1</script>')),
        paragraph(text('<img src=x onerror="window.__pwned = 2">')),
        paragraph(text('click me', [{ type: 'link', attrs: { href: 'javascript:window.__pwned=3' } }])),
        paragraph(text('tabbed', [{ type: 'link', attrs: { href: 'java\tscript:window.__pwned=4' } }])),
        paragraph(text('the method paper', [{ type: 'link', attrs: { href: 'https://example.org/methods' } }])),
      ],
    };
    const { container } = renderFrozen(snapshotOf(doc));
    // The text shows as text ...
    expect(screen.getByText('<script>window.__pwned = 1</script>').tagName).toBe('P');
    expect(screen.getByText('<img src=x onerror="window.__pwned = 2">').tagName).toBe('P');
    // ... and no element came of it.
    expect(container.querySelector('script, img, iframe, [onerror]')).toBeNull();
    // Only the https link stays a link; the javascript: ones (also with a tab in the scheme, WHATWG URL Standard) are plain text.
    const links = [...container.querySelectorAll('a')];
    expect(links.map((a) => a.getAttribute('href'))).toEqual(['https://example.org/methods']);
    expect(links[0].getAttribute('rel')).toBe('noopener noreferrer nofollow');
    expect(screen.getByText('click me').closest('a')).toBeNull();
    expect(screen.getByText('tabbed').closest('a')).toBeNull();
    expect(w.__pwned).toBeUndefined();
  });

  it('falls back to the plain text when the stored document does not fit the schema', () => {
    renderFrozen(snapshotOf({ type: 'doc', content: [{ type: 'mysteryBlock', content: [text('still readable')] }] }));
    expect(screen.getByText('still readable').tagName).toBe('P');
    expect(screen.getByRole('note').textContent).toContain('does not fit Upwell’s document schema');
  });
});
