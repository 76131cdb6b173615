import { describe, expect, it } from 'vitest';
import { escapeHtml } from './escape-html';

describe('escapeHtml()', () => {
  it('replaces the five characters of OWASP XSS Prevention Cheat Sheet rule 1 by their entities', () => {
    expect(escapeHtml(`<a href="x" title='y'>&</a>`)).toBe('&lt;a href=&quot;x&quot; title=&#39;y&#39;&gt;&amp;&lt;/a&gt;');
  });

  it('escapes an ampersand once, so an existing entity shows as typed', () => {
    expect(escapeHtml('&lt;')).toBe('&amp;lt;');
  });

  it('leaves other text, including non-Latin letters, unchanged', () => {
    expect(escapeHtml('Niño 3.4 — ΔDIC')).toBe('Niño 3.4 — ΔDIC');
  });
});
