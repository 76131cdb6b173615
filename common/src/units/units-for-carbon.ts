/** The element a CF standard name says an amount is of, or null when it names none. */
export function speciesOfStandardName(standardName: string | null | undefined): 'C' | 'CO2' | null {
  const name = (standardName ?? '').toLowerCase();
  // "…_expressed_as_carbon" (CMIP6 fgco2) and "…inorganic_carbon…" (dissic) count carbon atoms.
  if (/expressed_as_carbon\b|organic_carbon|_carbon_in_sea_water/.test(name)) return 'C';
  if (/carbon_dioxide/.test(name)) return 'CO2';
  return null;
}

/**
 * Names the element of a model unit that has none, from the variable's CF standard name (CF
 * standard-name table; CMIP6 data request [memory]): "kg m-2 s-1" of
 * surface_downward_mass_flux_of_carbon_dioxide_expressed_as_carbon becomes "kg C m-2 s-1", of
 * …_carbon_dioxide "kg CO2 m-2 s-1"; "mol m-3" of mole_concentration_of_dissolved_inorganic_carbon_in_sea_water
 * "mol C m-3"; "umol kg-1" likewise. The element goes after the first mass or mole word without one;
 * units that already name an element, or a standard name that names none, are returned unchanged.
 */
export function unitsForCarbon(units: string, standardName: string | null | undefined): string {
  const species = speciesOfStandardName(standardName);
  if (!species) return units;
  const first = /^(\s*)((?:n|u|µ|m|k|M|G|T|P)?(?:g|mol|t))(?=$|[\s/·*^-]|\d)/.exec(units);
  if (!first) return units;
  const rest = units.slice(first[0].length);
  // Already followed by an element word ("kg C m-2 s-1"): nothing to add.
  if (/^\s+(C|CO2)(?=$|[\s/·*^-])/.test(rest)) return units;
  // An exponent on the word belongs to the mass, so the element follows it.
  const exponent = /^(\^?-?\d+)/.exec(rest)?.[0] ?? '';
  if (exponent) return units;
  return `${first[1]}${first[2]} ${species}${rest}`;
}
