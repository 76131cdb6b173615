import { CfTimeError, decodeCfTime, monthlyAxis, normalizeCalendar, type CfCalendar, type DateTimeParts, type MonthlyAxis } from '@upwell/common';
import { stringAttribute } from './attributes';
import { createCfDecoder, decodedCopy } from './cf-decoder';
import { NetcdfImportError } from './netcdf-import-error';
import type { NetcdfFile } from './types';

/** A decoded time coordinate placed on months. */
export interface MonthlyTime {
  variable: string;
  dimension: string;
  units: string;
  calendar: CfCalendar;
  /** The instant standing for each step: the midpoint of its bounds when there are bounds, else the time value. */
  times: DateTimeParts[];
  axis: MonthlyAxis;
  /** True when months were read from the midpoints of the `bounds` variable (CF 1.11 §7.1). */
  fromBounds: boolean;
}

/**
 * Decodes a time coordinate (CF 1.11 §4.4) and checks it is monthly.
 * When the time variable has `bounds` (CF 1.11 §7.1), each step's month is the month holding the
 * middle of its interval, so a January mean stamped at its end (Feb 1, 00:00) stays January;
 * without bounds, the month holding the time value. CF time problems come back as
 * `NetcdfImportError` ('bad-time') whose `where` names the attribute or index.
 */
export function readMonthlyTime(file: NetcdfFile, timeVariable: string, options: { allowGaps?: boolean } = {}): MonthlyTime {
  const v = file.variable(timeVariable);
  const units = stringAttribute(v.attributes, 'units') ?? '';
  const calendarAttribute = stringAttribute(v.attributes, 'calendar');
  try {
    const calendar = normalizeCalendar(calendarAttribute);
    const values = decodedCopy(file.read(v.name), createCfDecoder(v)).values;
    let instants: Float64Array = values;
    let fromBounds = false;
    const boundsName = stringAttribute(v.attributes, 'bounds');
    const bounds = boundsName ? file.variables.find((b) => b.name === boundsName) : undefined;
    if (bounds && bounds.shape.length === 2 && bounds.shape[0] === values.length && bounds.shape[1] === 2) {
      const edges = decodedCopy(file.read(bounds.name), createCfDecoder(bounds)).values;
      instants = new Float64Array(values.length);
      for (let i = 0; i < values.length; i++) instants[i] = (edges[2 * i] + edges[2 * i + 1]) / 2;
      fromBounds = instants.every(Number.isFinite);
      if (!fromBounds) instants = values;
    }
    const times = decodeCfTime(instants, units, calendarAttribute);
    const axis = monthlyAxis(times, { allowGaps: options.allowGaps, variable: v.name });
    return { variable: v.name, dimension: v.dims[0], units, calendar, times, axis, fromBounds };
  } catch (error) {
    if (error instanceof CfTimeError) {
      const where =
        error.code === 'unknown-calendar' || error.code === 'no-calendar'
          ? `${v.name}:calendar`
          : error.code === 'bad-units' || error.code === 'unsupported-unit' || error.code === 'bad-reference'
            ? `${v.name}:units`
            : error.index !== undefined
              ? `${v.name}[${error.index}]`
              : v.name;
      throw new NetcdfImportError('bad-time', where, `time variable ${v.name}: ${error.message}`, { cause: error });
    }
    throw error;
  }
}
