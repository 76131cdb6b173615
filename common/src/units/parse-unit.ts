import { CARBON_MOLAR_MASS, CO2_MOLAR_MASS, SECONDS_PER_DAY, SECONDS_PER_JULIAN_YEAR, SECONDS_PER_MEAN_MONTH } from './constants';
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
const LENGTH: Record<string, [number, string]> = { m: [1, 'm'], km: [1e3, 'km'] };
const QUANTITY = /^(n|u|µ|m|k|M|G|T|P)?(g|mol|t)(C|CO2)?$/;

/**
 * Parses unit strings of the carbon trade: "PgC/yr", "Pg C yr-1", "GtC yr^-1", "Pg CO2/yr",
 * "mol C m-2 s-1", "mol C/m2/s", "mmol m-3", "g C m-2 d-1", "Tg C/month". Words after a "/" are
 * divided (up to the next "/"). Masses of C or CO2 become moles of carbon (one C per CO2) with the
 * CIAAW conventional weights 12.011 and 44.009 g/mol; "Gt" = Pg. A bare mole unit ("mmol m-3")
 * names no element: it is an amount of an unnamed species, convertible to other mole units but
 * not to mol C or to a mass — write "mmol C m-3" for carbon. "yr" is the Julian year (365.25 d),
 * "month" a mean month (1/12 Julian year). Throws UnitError for anything else.
 */
export function parseUnit(text: string): ParsedUnit {
  const u: ParsedUnit = { factor: 1, carbon: 0, amount: 0, time: 0, length: 0, canonical: '', withoutTime: '' };
  const parts: string[] = [];
  const timeless: string[] = [];
  for (const { symbol, exp } of attachElements(tokenize(text), text)) {
    const q = QUANTITY.exec(symbol);
    const time = TIME[symbol];
    const length = LENGTH[symbol];
    if (q) {
      const [, pre = '', base, element] = q;
      if (base === 't' && !['', 'k', 'M', 'G'].includes(pre)) throw new UnitError(`unit "${text}": "${symbol}" is not a supported tonne`, text);
      if (base !== 'mol' && element === undefined) throw new UnitError(`unit "${text}": a mass needs an element, e.g. "Pg C" or "Pg CO2"`, text);
      // Grams (or tonnes = 1e6 g) of C or CO2 → moles of carbon; moles of C or an unnamed species as they are.
      const grams = base === 't' ? 1e6 : 1;
      const perMol = base === 'mol' ? 1 : grams / (element === 'C' ? CARBON_MOLAR_MASS : CO2_MOLAR_MASS);
      u.factor *= Math.pow(PREFIX[pre] * perMol, exp);
      if (element === undefined) u.amount += exp;
      else u.carbon += exp;
      parts.push(`${pre}${base}${element ? ` ${element}` : ''}${exp === 1 ? '' : exp}`);
      timeless.push(parts[parts.length - 1]);
    } else if (time || length) {
      const [factor, spelling] = time ?? length;
      u.factor *= Math.pow(factor, exp);
      if (time) u.time += exp;
      else u.length += exp;
      parts.push(`${spelling}${exp === 1 ? '' : exp}`);
      if (!time) timeless.push(parts[parts.length - 1]);
    } else {
      throw new UnitError(`unit "${text}": cannot read "${symbol}"`, text);
    }
  }
  u.canonical = parts.join(' ');
  u.withoutTime = timeless.join(' ');
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
