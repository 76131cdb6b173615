import { describe, expect, it } from 'vitest';
import { fixture } from '../../../test/fixtures/netcdf/fixture-path';
import { coordinateRole, findCoordinates } from './coordinates';
import { openNetcdf } from './open-netcdf';
import type { NcVariable } from './types';

const v = (attributes: NcVariable['attributes'], name = 'c'): NcVariable => ({ name, dims: [name], shape: [2], dtype: 'float64', attributes });

async function coordinatesOf(name: string) {
  const f = await openNetcdf(fixture(name));
  try {
    return findCoordinates(f);
  } finally {
    f.close();
  }
}

describe('coordinateRole() (CF 1.11 §4)', () => {
  it.each([
    [{ axis: 'T' }, 'time', 'axis'],
    [{ standard_name: 'time' }, 'time', 'standard_name'],
    [{ units: 'hours since 1900-01-01' }, 'time', 'units'],
    [{ axis: 'Y' }, 'latitude', 'axis'],
    [{ standard_name: 'latitude' }, 'latitude', 'standard_name'],
    [{ units: 'degrees_north' }, 'latitude', 'units'],
    [{ units: 'degreesN' }, 'latitude', 'units'],
    [{ units: 'degree_E' }, 'longitude', 'units'],
    [{ axis: 'Z' }, 'depth', 'axis'],
    [{ standard_name: 'depth' }, 'depth', 'standard_name'],
    [{ positive: 'down', units: 'm' }, 'depth', 'positive'],
  ])('%j → %s (by %s)', (attributes, role, by) => {
    expect(coordinateRole(v(attributes))).toEqual({ role, recognisedBy: by });
  });

  it('does not take a projected x/y in metres for longitude/latitude', () => {
    expect(coordinateRole(v({ axis: 'X', units: 'm' }))).toBeNull();
  });

  it('says nothing about a variable without telling attributes', () => {
    expect(coordinateRole(v({ units: 'K' }))).toBeNull();
  });
});

describe('findCoordinates()', () => {
  it('finds coordinates named t, y, x through their attributes only', async () => {
    const { coordinates, notes } = await coordinatesOf('field-descending.nc');
    expect(coordinates.map((c) => `${c.dimension}:${c.role}:${c.recognisedBy}`)).toEqual(['t:time:axis', 'y:latitude:units', 'x:longitude:axis']);
    expect(notes).toEqual([]);
  });

  it('finds depth by its positive attribute (CF 1.11 §4.3)', async () => {
    const { coordinates } = await coordinatesOf('field-depth.nc');
    expect(coordinates.find((c) => c.role === 'depth')).toMatchObject({ variable: 'depth', recognisedBy: 'positive' });
  });

  it('falls back to dimension names only when attributes say nothing, and notes it', async () => {
    const { coordinates, notes } = await coordinatesOf('field-bare-names.nc');
    expect(coordinates.map((c) => `${c.variable}:${c.role}:${c.recognisedBy}`)).toEqual(['time:time:units', 'lat:latitude:name', 'lon:longitude:name']);
    expect(notes).toEqual([
      'lat is taken as the latitude coordinate by its name only: it has no axis, standard_name or units attribute saying so',
      'lon is taken as the longitude coordinate by its name only: it has no axis, standard_name or units attribute saying so',
    ]);
  });
});
