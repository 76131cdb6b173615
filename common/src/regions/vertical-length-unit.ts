// TODO(units): switch to the shared unit parser once it reads lengths ("centimeters" and kin are
// being added there); this small table only serves the vertical axis meanwhile.
const METRES_PER_UNIT: Record<string, number> = {
  m: 1,
  meter: 1,
  meters: 1,
  metre: 1,
  metres: 1,
  cm: 0.01,
  centimeter: 0.01,
  centimeters: 0.01,
  centimetre: 0.01,
  centimetres: 0.01,
  km: 1000,
};

/**
 * Metres per unit of a vertical coordinate or thickness (`m`, `cm`, `centimeters`, `km`… as UDUNITS
 * spells them; CESM/POP writes depths in cm). null for a unit that is not a length, so the caller
 * can say which variable has which unit.
 */
export function metresPerVerticalUnit(units: string | undefined): number | null {
  if (units === undefined) return null;
  return METRES_PER_UNIT[units.trim().toLowerCase()] ?? null;
}
