import { describe, expect, it } from 'vitest';
import { plainText } from './text';

// Control characters: Unicode 15, ch. 23.1 — C0 is U+0000–U+001F, plus DEL U+007F.
describe('plainText() refuses control characters in request text', () => {
  const single = plainText({ what: 'title' }).trim().max(50);
  const multi = plainText({ what: 'notes', multiline: true });

  it('accepts ordinary text, accents, emoji and CO₂ subscripts', () => {
    expect(single.parse('  Warm event 1997–98 · CO₂ ✓ ')).toBe('Warm event 1997–98 · CO₂ ✓');
  });

  it('refuses NUL, escape, backspace, vertical tab and DEL anywhere, naming the field', () => {
    for (const c of ['\u0000', '\u001b', '\u0008', '\u000b', '\u007f', '\u001f']) {
      const r = single.safeParse(`a${c}b`);
      expect(r.success, JSON.stringify(c)).toBe(false);
      expect(r.error!.issues[0].message).toMatch(/^title must not contain control characters/);
      expect(multi.safeParse(`a${c}b`).success, JSON.stringify(c)).toBe(false);
    }
  });

  it('single-line text refuses tabs and line breaks inside but not around it (trim removes those)', () => {
    expect(single.safeParse('a\tb').success).toBe(false);
    expect(single.safeParse('a\nb').success).toBe(false);
    expect(single.parse('\ttitle\r\n')).toBe('title');
  });

  it('multi-line text keeps tabs, line feeds and carriage returns', () => {
    expect(multi.parse('first line\r\n\tsecond line\n')).toBe('first line\r\n\tsecond line\n');
  });

  it('refuses only C0 and DEL: a Unicode line separator (U+2028) is text', () => {
    // U+0085 (NEL) and U+2028 are line separators some sources paste; they are text, not control codes of C0.
    expect(single.safeParse('a\u2028b').success).toBe(true);
  });
});
