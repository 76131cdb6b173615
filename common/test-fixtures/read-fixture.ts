/** Reads the committed reference data for the engine's tests (Node only: tests, not the engine). */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';

/** The text of a fixture file in common/test-fixtures. */
export function fixtureText(name: string): string {
  return readFileSync(join(__dirname, name), 'utf8');
}

/** All numbers of a whitespace-separated fixture, skipping '#' comment lines. */
export function fixtureNumbers(name: string): number[] {
  return fixtureText(name)
    .split('\n')
    .filter((line) => !line.startsWith('#'))
    .join(' ')
    .split(/\s+/)
    .filter((t) => t !== '')
    .map(Number);
}

/** Rows of a comma-separated fixture with a header line, skipping '#' comment lines. */
export function fixtureCsv(name: string): Record<string, number>[] {
  const lines = fixtureText(name).split('\n').filter((l) => l.trim() !== '' && !l.startsWith('#'));
  const header = lines[0].split(',').map((h) => h.replace(/"/g, ''));
  return lines.slice(1).map((line) => {
    const cells = line.split(',');
    return Object.fromEntries(header.map((h, i) => [h, Number(cells[i])]));
  });
}

/** The Niño 1+2 SST table (statsmodels copy) as one monthly series from 1950-01. */
export function nino12Series(): { start: string; values: number[] } {
  const months = ['JAN', 'FEB', 'MAR', 'APR', 'MAY', 'JUN', 'JUL', 'AUG', 'SEP', 'OCT', 'NOV', 'DEC'];
  const values = fixtureCsv('elnino-nino12-1950-2010.csv').flatMap((row) => months.map((m) => row[m]));
  return { start: '1950-01', values };
}
