import { parseUnit, type ParsedUnit, type ParseUnitOptions } from './parse-unit';
import { UnitError } from './unit-error';

/** Whether two parsed units have the same dimensions (and so convert by a factor). */
function sameDimensions(a: ParsedUnit, b: ParsedUnit): boolean {
  return a.carbon === b.carbon && a.amount === b.amount && a.time === b.time && a.length === b.length;
}

/**
 * The factor f with value_in_`to` = f · value_in_`from`, e.g. unitFactor("Pg C/yr", "Pg CO2/yr") =
 * 44.009/12.011 ≈ 3.664. Throws UnitError naming both units when their dimensions differ (mass per
 * area vs per volume, carbon vs an unnamed species, a rate vs an amount).
 */
export function unitFactor(from: string, to: string, options: ParseUnitOptions = {}): number {
  const a = parseUnit(from, options);
  const b = parseUnit(to, options);
  if (!sameDimensions(a, b)) {
    throw new UnitError(`cannot convert "${from}" to "${to}": ${describe(a)} is not ${describe(b)}`, from, to);
  }
  return a.factor / b.factor;
}

/** `value` expressed in `from` units, converted to `to` units (see unitFactor). */
export function convert(value: number, from: string, to: string, options: ParseUnitOptions = {}): number {
  return value * unitFactor(from, to, options);
}

/** Dimension words for error messages, e.g. "carbon per time". */
function describe(u: ParsedUnit): string {
  const words: string[] = [];
  if (u.carbon) words.push(u.carbon === 1 ? 'carbon' : `carbon^${u.carbon}`);
  if (u.amount) words.push(u.amount === 1 ? 'an amount of an unnamed species' : `amount^${u.amount}`);
  if (u.length) words.push(u.length === -2 ? 'per area' : u.length === -3 ? 'per volume' : `length^${u.length}`);
  if (u.time) words.push(u.time === -1 ? 'per time' : `time^${u.time}`);
  return words.length ? words.join(' ') : 'dimensionless';
}
