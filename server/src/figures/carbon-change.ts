import { AnalysisInputError, integrate, inventoryChange, parseUnit, unitFactor, UnitError, type CarbonTreatment } from '@upwell/common';

/** How a carbon series' change over an event is found, decided once from its unit. */
export interface CarbonUnitPlan {
  treatment: CarbonTreatment;
  /** Factor from the change's unit (the rate's unit without time, or the inventory's) to Pg C. */
  toPgC: number;
  /** Why no change can be computed, naming the unit; set when treatment is null. */
  reason: string | null;
}

/**
 * Reads a carbon series' unit: a rate of a carbon amount ("Pg C/yr", "mol C s-1") is integrated,
 * an amount ("Pg C", "mol C") differenced; anything else (per area, not carbon, unreadable) gives
 * no change, with a reason that names the unit.
 */
export function planCarbonChange(units: string): CarbonUnitPlan {
  const none = (reason: string): CarbonUnitPlan => ({ treatment: null, toPgC: NaN, reason });
  let parsed;
  try {
    parsed = parseUnit(units);
  } catch (e) {
    if (e instanceof UnitError) return none(`unit "${units}" cannot be read as a carbon unit (${e.message})`);
    throw e;
  }
  const amount = parsed.time === -1 ? parsed.withoutTime : parsed.time === 0 ? units : null;
  if (amount === null || amount === '') return none(`unit "${units}" is neither a carbon rate nor a carbon amount`);
  try {
    const toPgC = unitFactor(amount, 'Pg C');
    return { treatment: parsed.time === -1 ? 'rate-integrated' : 'inventory-difference', toPgC, reason: null };
  } catch (e) {
    if (e instanceof UnitError) return none(`unit "${units}" is neither a carbon rate nor a carbon amount convertible to Pg C`);
    throw e;
  }
}

/** A change in Pg C, or null with the reason. */
export interface CarbonChange {
  value: number | null;
  warning: string | null;
}

/**
 * The change of a carbon anomaly over an event's months start..end (inclusive), in Pg C:
 * for a rate, the integral of the anomaly over the event (engine `integrate`: calendar month
 * lengths, "yr" the Julian year of 365.25 d); for an inventory, its change over the same span, from
 * the start of the first month to the end of the last (engine `inventoryChange`: boundaries
 * interpolated between the monthly means either side). A missing month, or an event outside the
 * series, gives null with a warning.
 */
export function carbonChange(
  anomaly: { start: string; values: ReadonlyArray<number | null> },
  units: string,
  plan: CarbonUnitPlan,
  event: { start: string; end: string },
): CarbonChange {
  if (plan.treatment === null) return { value: null, warning: plan.reason };
  if (plan.treatment === 'rate-integrated') {
    try {
      return { value: integrate({ series: anomaly, units, from: event.start, to: event.end }).total * plan.toPgC, warning: null };
    } catch (e) {
      if (e instanceof AnalysisInputError) return { value: null, warning: e.message };
      throw e;
    }
  }
  try {
    return { value: inventoryChange({ series: anomaly, from: event.start, to: event.end }) * plan.toPgC, warning: null };
  } catch (e) {
    if (e instanceof AnalysisInputError) return { value: null, warning: e.message };
    throw e;
  }
}
