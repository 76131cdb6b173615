import { DriverException } from '@mikro-orm/core';

/** What SQLite says about a broken constraint: names of tables and columns only, never values. */
const CONSTRAINT = /\b((?:UNIQUE|NOT NULL|FOREIGN KEY|CHECK) constraint failed(?:: [\w.]+(?:, [\w.]+)*)?)/;

/**
 * An error as it may be written to the log. A database error's message holds
 * the whole SQL statement with its values inlined (MikroORM formats parameters
 * into the statement, and the driver repeats it), so e-mails and password
 * hashes would land in the log: it is reduced to its kind, code and, for a
 * broken constraint, which one. Other errors keep their stack.
 */
export function loggableError(err: unknown): string {
  if (err instanceof DriverException) {
    const constraint = CONSTRAINT.exec(err.message)?.[1];
    return `database error ${err.name}${err.code ? ` (${err.code})` : ''}${constraint ? `: ${constraint}` : ''} — statement and values not logged`;
  }
  return err instanceof Error ? (err.stack ?? err.message) : String(err);
}
