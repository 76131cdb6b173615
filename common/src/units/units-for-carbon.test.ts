import { describe, expect, it } from 'vitest';
import { CARBON_MOLAR_MASS, CO2_MOLAR_MASS, SEAWATER_DENSITY_CONVENTION } from './constants';
import { convert, unitFactor } from './convert';
import { parseUnit } from './parse-unit';
import { UnitError } from './unit-error';
import { speciesOfStandardName, unitsForCarbon } from './units-for-carbon';

// Handbook values: molar mass of C 12.011 g/mol and of CO2 44.009 g/mol (CIAAW conventional atomic
// weights); 1 Pg = 1e15 g; 1 cm = 0.01 m (SI). Seawater density 1025 kg m-3 is a convention (named so).
describe('units models write (issue 14 item 7)', () => {
  it('reads a CMIP-style CO2 flux in kg m-2 s-1 as kg of C or of CO2 by its CF standard name', () => {
    expect(unitsForCarbon('kg m-2 s-1', 'surface_downward_mass_flux_of_carbon_dioxide_expressed_as_carbon')).toBe('kg C m-2 s-1');
    expect(unitsForCarbon('kg m-2 s-1', 'surface_downward_mass_flux_of_carbon_dioxide')).toBe('kg CO2 m-2 s-1');
    // 1 kg CO2 = 12.011/44.009 kg C.
    expect(unitFactor(unitsForCarbon('kg m-2 s-1', 'surface_downward_mass_flux_of_carbon_dioxide'), 'kg C m-2 s-1')).toBeCloseTo(CARBON_MOLAR_MASS / CO2_MOLAR_MASS, 14);
    // 1 kg C m-2 s-1 over a year = 31,557,600 kg C m-2 (Julian year) = 3.15576e-5 Pg C m-2.
    expect(convert(1, 'kg C m-2 s-1', 'Pg C m-2 yr-1')).toBeCloseTo(31_557_600 * 1e3 / 1e15, 18);
  });

  it('reads DIC in mol m-3, and a volume integral "mol m-3 m3" simplifies to mol and converts to Pg C (1 mol C = 12.011 g)', () => {
    const dic = unitsForCarbon('mol m-3', 'mole_concentration_of_dissolved_inorganic_carbon_in_sea_water');
    expect(dic).toBe('mol C m-3');
    expect(parseUnit('mol m-3 m3').canonical).toBe('mol');
    const integral = unitsForCarbon('mol m-3 m3', 'mole_concentration_of_dissolved_inorganic_carbon_in_sea_water');
    expect(parseUnit(integral).canonical).toBe('mol C');
    // 2 mol m-3 over 1e15 m3 = 2e15 mol C = 2e15 × 12.011 g = 24.022 Pg C.
    expect(convert(2e15, integral, 'Pg C')).toBeCloseTo(24.022, 10);
  });

  it('turns µmol kg-1 into mmol m-3 with the seawater density: 1025 kg m-3 by convention, or the one stated', () => {
    expect(SEAWATER_DENSITY_CONVENTION).toBe(1025);
    expect(convert(2000, 'µmol C kg-1', 'mmol C m-3')).toBeCloseTo(2050, 10);
    expect(convert(2000, 'umol kg-1', 'mol m-3')).toBeCloseTo(2.05, 12);
    expect(convert(2000, 'umol kg-1', 'mol m-3', { seawaterDensity: 1027.5 })).toBeCloseTo(2.055, 12);
    expect(parseUnit('umol kg-1').seawaterDensity).toBe(1025);
    expect(parseUnit('mol m-3').seawaterDensity).toBeNull();
    expect(unitsForCarbon('umol kg-1', 'moles_of_dissolved_inorganic_carbon_per_unit_mass_in_sea_water')).toBe('umol C kg-1');
  });

  it('reads depths in centimeters / centimetres (1 cm = 0.01 m)', () => {
    expect(convert(150, 'centimeters', 'm')).toBeCloseTo(1.5, 14);
    expect(convert(150, 'centimetres', 'm')).toBeCloseTo(1.5, 14);
    expect(convert(2, 'metres', 'cm')).toBeCloseTo(200, 12);
  });

  it('leaves units with an element, and standard names without one, as they are; still refuses a bare mass', () => {
    expect(unitsForCarbon('Pg C yr-1', 'surface_downward_mass_flux_of_carbon_dioxide_expressed_as_carbon')).toBe('Pg C yr-1');
    expect(unitsForCarbon('kg m-2 s-1', 'sea_surface_temperature')).toBe('kg m-2 s-1');
    expect(speciesOfStandardName(null)).toBeNull();
    expect(() => parseUnit('kg m-2 s-1')).toThrow(UnitError);
  });
});
