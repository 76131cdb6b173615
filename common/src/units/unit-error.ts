/**
 * A unit string the engine cannot read, or a conversion between units of different dimensions
 * (the message names both units). `from`/`to` hold the unit strings involved.
 */
export class UnitError extends Error {
  constructor(
    message: string,
    readonly from: string,
    readonly to?: string,
  ) {
    super(message);
    this.name = 'UnitError';
  }
}
