/** Why a CF time coordinate could not be decoded; `code` lets callers branch without parsing messages. */
export type CfTimeErrorCode =
  | 'bad-units'
  | 'unsupported-unit'
  | 'bad-reference'
  | 'unknown-calendar'
  | 'no-calendar'
  | 'bad-value'
  | 'not-monthly';

/**
 * An error decoding or checking a CF time axis. Messages are written for the person
 * who uploaded the file: they name the attribute, the index or the dates concerned.
 */
export class CfTimeError extends Error {
  readonly code: CfTimeErrorCode;
  /** Index into the time axis the error is about, when there is one. */
  readonly index?: number;

  constructor(code: CfTimeErrorCode, message: string, index?: number) {
    super(message);
    this.name = 'CfTimeError';
    this.code = code;
    if (index !== undefined) this.index = index;
  }
}
