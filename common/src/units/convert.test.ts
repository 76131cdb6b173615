import { describe, expect, it } from 'vitest';
import { convert, unitFactor } from './convert';
import { parseUnit } from './parse-unit';
import { UnitError } from './unit-error';

describe('parseUnit()', () => {
  it('reads the spellings of the trade into one canonical form', () => {
    expect(parseUnit('PgC/yr').canonical).toBe('Pg C yr-1');
    expect(parseUnit('Pg C yr-1').canonical).toBe('Pg C yr-1');
    expect(parseUnit('Pg C yr^-1').canonical).toBe('Pg C yr-1');
    expect(parseUnit('Pg C yr⁻¹').canonical).toBe('Pg C yr-1');
    expect(parseUnit('mol C m-2 s-1').canonical).toBe('mol C m-2 s-1');
    expect(parseUnit('mol C/m2/s').canonical).toBe('mol C m-2 s-1');
    expect(parseUnit('mmol m-3').canonical).toBe('mmol m-3');
    expect(parseUnit('Pg CO2/yr').canonical).toBe('Pg CO2 yr-1');
  });

  it('treats "mmol m-3" (no element) as an unnamed species, not carbon', () => {
    const u = parseUnit('mmol m-3');
    expect(u.amount).toBe(1);
    expect(u.carbon).toBe(0);
  });

  it('rejects unreadable strings and a mass without an element with UnitError', () => {
    for (const bad of ['', 'furlong', 'Pg/yr', 'C Pg', 'Pg C /', 'Eg C']) expect(() => parseUnit(bad)).toThrow(UnitError);
  });
});

describe('unitFactor() / convert() — worked examples', () => {
  it('1 Pg C = 1e15 g / 12.011 g/mol = 8.3257e13 mol C (check-values.json; CIAAW conventional weight)', () => {
    expect(convert(1, 'Pg C', 'mol C')).toBeCloseTo(8.3257e13, -9);
    expect(convert(1, 'Pg C', 'mol C')).toBe(1e15 / 12.011);
  });

  it('1 Pg C = 44.009/12.011 = 3.664 Pg CO2', () => {
    expect(unitFactor('PgC/yr', 'Pg CO2/yr')).toBeCloseTo(3.664, 3);
    expect(unitFactor('Pg C', 'Pg CO2')).toBeCloseTo(44.009 / 12.011, 14);
  });

  it('1 Gt C = 1 Pg C = 1000 Tg C', () => {
    expect(unitFactor('GtC yr-1', 'PgC/yr')).toBeCloseTo(1, 14);
    expect(unitFactor('Pg C', 'Tg C')).toBeCloseTo(1000, 10);
  });

  it('1 Pg C/yr = 1000/12 Tg C/month (mean month = Julian year / 12)', () => {
    expect(convert(1, 'PgC/yr', 'TgC/month')).toBeCloseTo(1000 / 12, 10);
  });

  it('1 mol C m-2 s-1 = 12.011 × 31,557,600 g C m-2 yr-1 (Julian year)', () => {
    expect(convert(1, 'mol C m-2 s-1', 'g C m-2 yr-1')).toBeCloseTo(12.011 * 31557600, 4);
  });

  it('1 mmol m-3 = 1e-3 mol m-3 (unnamed species keeps its own dimension)', () => {
    expect(convert(1, 'mmol m-3', 'mol m-3')).toBeCloseTo(1e-3, 18);
  });

  it('refuses incompatible dimensions with a UnitError naming both units', () => {
    const cases: [string, string][] = [['Pg C m-2', 'mol C m-3'], ['mmol m-3', 'mmol C m-3'], ['PgC/yr', 'PgC'], ['mol C', 's']];
    for (const [a, b] of cases) {
      try {
        unitFactor(a, b);
        throw new Error('no error');
      } catch (e) {
        expect(e).toBeInstanceOf(UnitError);
        expect((e as Error).message).toContain(`"${a}"`);
        expect((e as Error).message).toContain(`"${b}"`);
      }
    }
  });
});
