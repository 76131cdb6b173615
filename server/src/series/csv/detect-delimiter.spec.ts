import { describe, expect, it } from 'vitest';
import { detectDelimiter } from './detect-delimiter';

const batch = (text: string) => [{ text, firstLine: 1, lineCount: text.split('\n').length }];

describe('detectDelimiter()', () => {
  it.each([
    ['comma', 'date,a,b\n1997-01,1.5,2\n1997-02,1.6,3'],
    ['comma', 'date, a, b\n1997-01, 1.5, 2\n1997-02, 1.6, 3'], // spaces after commas split evenly too
    ['semicolon', 'date;a;b\n1997-01;1,5;2,25\n1997-02;1,6;3,5'], // decimal commas would also split evenly
    ['semicolon', 'date;a\n1997-01;1,5\n1997-02;2'],
    ['tab', 'date\ta\tb\n1997-01\t1.5\t\n1997-02\t\t3'], // empty cells: only tabs keep the count
    ['whitespace', '  1997   1.5   2.0\n  1998  -0.3  11.2'],
    ['whitespace', 'year jan feb\n1997\t1.5 2.0\n1998 -0.3\t11.2'], // tabs and spaces mixed
    ['comma', 'Invented title line\ndate,a\n1997-01,1\n1997-02,2\n1997-03,3'],
  ])('finds %s', (expected, text) => {
    expect(detectDelimiter(batch(text))).toBe(expected);
  });

  it('finds none in a one-column file', () => {
    expect(detectDelimiter(batch('value\n1.5\n2.5'))).toBeNull();
  });
});
