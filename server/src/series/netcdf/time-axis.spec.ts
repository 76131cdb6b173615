import { afterEach, describe, expect, it } from 'vitest';
import { fixture } from '../../../test/fixtures/netcdf/fixture-path';
import { NetcdfImportError } from './netcdf-import-error';
import { openNetcdf } from './open-netcdf';
import { readMonthlyTime } from './time-axis';
import type { NetcdfFile } from './types';

const opened: NetcdfFile[] = [];
async function open(name: string): Promise<NetcdfFile> {
  const f = await openNetcdf(fixture(name));
  opened.push(f);
  return f;
}
afterEach(() => {
  while (opened.length) opened.pop()!.close();
});

async function timeFailure(name: string, options = {}): Promise<NetcdfImportError> {
  const f = await open(name);
  try {
    readMonthlyTime(f, f.variables.find((v) => v.name === 'time' || v.name === 't')!.name, options);
  } catch (error) {
    expect(error).toBeInstanceOf(NetcdfImportError);
    return error as NetcdfImportError;
  }
  throw new Error(`${name}: time axis accepted, but it should not have been`);
}

describe('readMonthlyTime() on files written by netCDF4-python / cftime 1.6.2 (CF 1.11 §4.4)', () => {
  it.each(['standard', 'noleap', '360_day', 'all_leap', 'proleptic_gregorian', 'julian', 'standard-1582'])(
    'calendar-%s.nc: every time value decodes to the date and second cftime stored beside it (check_ymd, check_sod)',
    async (name) => {
      const f = await open(`calendar-${name}.nc`);
      const monthly = readMonthlyTime(f, 'time');
      // Decode the raw time values too (the month comes from bounds midpoints, the check from the values).
      const ymd = Array.from(f.read('check_ymd'));
      const sod = Array.from(f.read('check_sod'));
      const { decodeCfTime } = await import('@upwell/common');
      const t = f.variable('time');
      const decoded = decodeCfTime(f.read('time'), String(t.attributes.units), String(t.attributes.calendar));
      expect(decoded.map((d) => d.year * 10000 + d.month * 100 + d.day)).toEqual(ymd);
      expect(decoded.map((d) => d.hour * 3600 + d.minute * 60 + d.second)).toEqual(sod);
      expect(monthly.axis.length).toBe(6);
      expect(monthly.fromBounds).toBe(true);
    },
  );

  it('places the 1582 file on consecutive months across the Julian/Gregorian switch (CF 1.11 §4.4.1)', async () => {
    const monthly = readMonthlyTime(await open('calendar-standard-1582.nc'), 'time');
    expect(monthly.axis.start).toBe('1582-08');
    expect(monthly.axis.length).toBe(6);
    // October 1582 has 21 days in the standard calendar (1–4, 15–31): its bounds midpoint, 10.5 days after
    // Oct 1, is 1582-10-21 12:00 — the date cftime 1.6.2 stored in check_ymd for that step.
    expect(monthly.times[2]).toMatchObject({ year: 1582, month: 10, day: 21, hour: 12 });
  });

  it('reads months of a 360_day file as 1999-11 .. 2000-04', async () => {
    const monthly = readMonthlyTime(await open('calendar-360_day.nc'), 'time');
    expect([monthly.axis.start, monthly.calendar]).toEqual(['1999-11', '360_day']);
  });

  it('refuses an unknown calendar, naming it and pointing at time:calendar', async () => {
    const e = await timeFailure('unknown-calendar.nc');
    expect([e.code, e.where]).toEqual(['bad-time', 'time:calendar']);
    expect(e.message).toMatch(/unknown calendar "lunar"/);
  });

  it('refuses calendar "none" (CF 1.11 §4.4.1: no calendar)', async () => {
    const e = await timeFailure('calendar-none.nc');
    expect(e.where).toBe('time:calendar');
    expect(e.message).toMatch(/calendar "none"/);
  });

  it('refuses time units without " since ", pointing at time:units', async () => {
    const e = await timeFailure('units-no-since.nc');
    expect(e.where).toBe('time:units');
    expect(e.message).toMatch(/"days" are not of the form "<unit> since <reference datetime>"/);
  });

  it('refuses a daily axis, naming the two indexes in one month', async () => {
    const e = await timeFailure('non-monthly.nc');
    expect(e.where).toBe('time[1]');
    expect(e.message).toMatch(/index 0 \(2000-01-01 00:00:00\) and index 1 \(2000-01-02 00:00:00\) fall in the same month 2000-01/);
  });

  it('refuses a duplicated month', async () => {
    const e = await timeFailure('duplicated-month.nc');
    expect(e.where).toBe('time[2]');
    expect(e.message).toMatch(/same month 2000-02/);
  });

  it('refuses a skipped month unless allowGaps, then lists it', async () => {
    const e = await timeFailure('skipped-month.nc');
    expect(e.message).toMatch(/skips 1 month\(s\).*first missing: 2000-03/);
    const monthly = readMonthlyTime(await open('skipped-month.nc'), 'time', { allowGaps: true });
    expect(monthly.axis.gaps).toEqual(['2000-03']);
    expect(Array.from(monthly.axis.slotOfStep)).toEqual([0, 1, 3]);
  });
});
