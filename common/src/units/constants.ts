/**
 * Conventional standard atomic weight of carbon, g/mol: CIAAW/IUPAC give the interval
 * [12.0096, 12.0116] and the conventional value 12.011 for calculations that need one number.
 */
export const CARBON_MOLAR_MASS = 12.011;

/** Molar mass of CO2, g/mol, from the conventional atomic weights C 12.011 and O 15.999 (CIAAW). */
export const CO2_MOLAR_MASS = 44.009;

/** Seconds in a Julian year of 365.25 days (the year the engine uses for "yr"), 31,557,600 s. */
export const SECONDS_PER_JULIAN_YEAR = 365.25 * 86400;

/** Seconds in a mean month, one twelfth of a Julian year (30.4375 d), used for "month" as a unit. */
export const SECONDS_PER_MEAN_MONTH = SECONDS_PER_JULIAN_YEAR / 12;

/** Seconds in a day. */
export const SECONDS_PER_DAY = 86400;

/**
 * Density of seawater, kg m-3, used to turn "per kg of seawater" into "per m3" when the data give no
 * density: 1025 kg m-3 is a common convention of the trade (surface seawater is ~1020–1030), not a measurement.
 */
export const SEAWATER_DENSITY_CONVENTION = 1025;
