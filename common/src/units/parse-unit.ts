import { CARBON_MOLAR_MASS, CO2_MOLAR_MASS, SEAWATER_DENSITY_CONVENTION, SECONDS_PER_DAY, SECONDS_PER_JULIAN_YEAR, SECONDS_PER_MEAN_MONTH } from './constants';
import { UnitError } from './unit-error';

/**
 * A parsed unit: the factor to base units and the exponents of its dimensions. Base units:
 * mol C (carbon, given as mass or moles of C or of CO2), mol (an unnamed species), s, m.
 */
export interface ParsedUnit {
  factor: number;
  carbon: number;
  amount: number;
  time: number;
  length: number;
  /** Canonical spelling, e.g. "Pg C yr-1", "mol C m-2 s-1". */
  canonical: string;
  /** Canonical spelling without the time words, e.g. "Pg C" for "Pg C yr-1" (the unit of a rate's integral). */
  withoutTime: string;
  /** Seawater density (kg m-3) used to turn "per kg" of seawater into per volume, or null when none was needed. */
  seawaterDensity: number | null;
}

/** Options of parseUnit(). */
export interface ParseUnitOptions {
  /** Density of seawater for "µmol kg-1" ↔ "mmol m-3", kg m-3; default SEAWATER_DENSITY_CONVENTION (1025). */
  seawaterDensity?: number;
}

interface Word {
  symbol: string;
  exp: number;
}

const PREFIX: Record<string, number> = { '': 1, n: 1e-9, u: 1e-6, 'µ': 1e-6, m: 1e-3, k: 1e3, M: 1e6, G: 1e9, T: 1e12, P: 1e15 };
const TIME: Record<string, [number, string]> = {
  s: [1, 's'], sec: [1, 's'], d: [SECONDS_PER_DAY, 'd'], day: [SECONDS_PER_DAY, 'd'],
  month: [SECONDS_PER_MEAN_MONTH, 'month'], mon: [SECONDS_PER_MEAN_MONTH, 'month'],
  yr: [SECONDS_PER_JULIAN_YEAR, 'yr'], year: [SECONDS_PER_JULIAN_YEAR, 'yr'], a: [SECONDS_PER_JULIAN_YEAR, 'yr'],
};
const LENGTH: Record<string, [number, string]> = {
  m: [1, 'm'], meter: [1, 'm'], meters: [1, 'm'], metre: [1, 'm'], metres: [1, 'm'], km: [1e3, 'km'],
  cm: [1e-2, 'cm'], centimeter: [1e-2, 'cm'], centimeters: [1e-2, 'cm'], centimetre: [1e-2, 'cm'], centimetres: [1e-2, 'cm'],
};
// A mass with no element after it, per unit (kg-1, g-1): a mass of seawater, turned into a volume by the density.
const SEAWATER_MASS: Record<string, number> = { kg: 1, g: 1e-3 };
const QUANTITY = /^(n|u|µ|m|k|M|G|T|P)?(g|mol|t)(C|CO2)?$/;

/**
 * Parses unit strings of the carbon trade: "PgC/yr", "Pg C yr-1", "GtC yr^-1", "Pg CO2/yr",
 * "mol C m-2 s-1", "mol C/m2/s", "mmol m-3", "g C m-2 d-1", "Tg C/month". Words after a "/" are
 * divided (up to the next "/"). Masses of C or CO2 become moles of carbon (one C per CO2) with the
 * CIAAW conventional weights 12.011 and 44.009 g/mol; "Gt" = Pg. A bare mole unit ("mmol m-3")
 * names no element: it is an amount of an unnamed species, convertible to other mole units but
 * not to mol C or to a mass — write "mmol C m-3" for carbon. "yr" is the Julian year (365.25 d),
 * "month" a mean month (1/12 Julian year). Lengths: m, km, cm (also spelled out: "centimeters",
 * "centimetres", "metres"). A mass without an element that divides ("µmol kg-1") is a mass of
 * seawater: 1 kg ≡ 1/ρ m³ with ρ = options.seawaterDensity, by default the convention of 1025 kg m-3
 * (so 1 µmol kg-1 = 1.025 mmol m-3). Repeated words combine ("mol m-3 m3" is "mol").
 * Throws UnitError for anything else.
 */
export function parseUnit(text: string, options: ParseUnitOptions = {}): ParsedUnit {
  const u: ParsedUnit = { factor: 1, carbon: 0, amount: 0, time: 0, length: 0, canonical: '', withoutTime: '', seawaterDensity: null };
  // Spelling → exponent, in order of first appearance, so repeated words combine.
  const parts = new Map<string, { exp: number; time: boolean }>();
  const add = (spelling: string, exp: number, time = false) => parts.set(spelling, { exp: (parts.get(spelling)?.exp ?? 0) + exp, time });
  for (const { symbol, exp } of attachElements(tokenize(text), text)) {
    const q = QUANTITY.exec(symbol);
    const time = TIME[symbol];
    const length = LENGTH[symbol];
    if (SEAWATER_MASS[symbol] !== undefined && exp < 0) {
      const rho = options.seawaterDensity ?? SEAWATER_DENSITY_CONVENTION;
      if (!(rho > 0)) throw new UnitError(`unit "${text}": the seawater density must be positive`, text);
      // kg^e of seawater = (1/ρ m³)^e.
      u.factor *= Math.pow(SEAWATER_MASS[symbol] / rho, exp);
      u.length += 3 * exp;
      u.seawaterDensity = rho;
      add('m', 3 * exp);
    } else if (q) {
      const [, pre = '', base, element] = q;
      if (base === 't' && !['', 'k', 'M', 'G'].includes(pre)) throw new UnitError(`unit "${text}": "${symbol}" is not a supported tonne`, text);
      if (base !== 'mol' && element === undefined) throw new UnitError(`unit "${text}": a mass needs an element, e.g. "Pg C" or "Pg CO2"`, text);
      // Grams (or tonnes = 1e6 g) of C or CO2 → moles of carbon; moles of C or an unnamed species as they are.
      const grams = base === 't' ? 1e6 : 1;
      const perMol = base === 'mol' ? 1 : grams / (element === 'C' ? CARBON_MOLAR_MASS : CO2_MOLAR_MASS);
      u.factor *= Math.pow(PREFIX[pre] * perMol, exp);
      if (element === undefined) u.amount += exp;
      else u.carbon += exp;
      add(`${pre}${base}${element ? ` ${element}` : ''}`, exp);
    } else if (time || length) {
      const [factor, spelling] = time ?? length;
      u.factor *= Math.pow(factor, exp);
      if (time) u.time += exp;
      else u.length += exp;
      add(spelling, exp, Boolean(time));
    } else {
      throw new UnitError(`unit "${text}": cannot read "${symbol}"`, text);
    }
  }
  const spell = (entries: [string, { exp: number; time: boolean }][]) =>
    entries.filter(([, p]) => p.exp !== 0).map(([w, p]) => `${w}${p.exp === 1 ? '' : p.exp}`).join(' ');
  u.canonical = spell([...parts]);
  u.withoutTime = spell([...parts].filter(([, p]) => !p.time));
  return u;
}

/** Joins a separate element word to the quantity before it: "Pg", "C" → "PgC"; "mmol", "C" → "mmolC". */
function attachElements(words: Word[], text: string): Word[] {
  const out: Word[] = [];
  for (const w of words) {
    if (w.symbol === 'C' || w.symbol === 'CO2') {
      const prev = out[out.length - 1];
      const q = prev ? QUANTITY.exec(prev.symbol) : null;
      if (!prev || !q || q[3] !== undefined || prev.exp !== w.exp) {
        throw new UnitError(`unit "${text}": "${w.symbol}" must follow a mass or mole unit`, text);
      }
      prev.symbol += w.symbol;
    } else out.push({ ...w });
  }
  return out;
}

/** Splits a unit string into symbols with integer exponents ("m-2", "m^-2", "m2", "yr⁻¹"). */
function tokenize(text: string): Word[] {
  const cleaned = text.trim().replace(/⁻/g, '-').replace(/¹/g, '1').replace(/²/g, '2').replace(/³/g, '3');
  if (cleaned === '') throw new UnitError('unit is empty', text);
  const out: Word[] = [];
  cleaned.split('/').forEach((segment, si) => {
    const words = segment.split(/[\s·*]+/).filter((w) => w !== '');
    if (words.length === 0) throw new UnitError(`unit "${text}": empty part around "/"`, text);
    for (const word of words) {
      const m = /^([A-Za-zµ]*?CO2|[A-Za-zµ]+)(?:\^?(-?\d+))?$/.exec(word);
      if (!m) throw new UnitError(`unit "${text}": cannot read "${word}"`, text);
      const exp = m[2] === undefined ? 1 : Number(m[2]);
      if (exp === 0) throw new UnitError(`unit "${text}": zero exponent in "${word}"`, text);
      out.push({ symbol: m[1], exp: si > 0 ? -exp : exp });
    }
  });
  return out;
}
