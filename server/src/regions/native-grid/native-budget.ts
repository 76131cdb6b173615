import { BadRequestException } from '@nestjs/common';
import type { BudgetTermSeries, RegionalBudgetBody } from '@upwell/common';
import { stringAttribute } from '../../series/netcdf/attributes';
import type { NetcdfFile } from '../../series/netcdf/types';
import { readMonthlyTime } from '../../series/netcdf/time-axis';
import { readNativeHorizontalGrid, type NativeHorizontalGrid } from './native-horizontal-grid';
import { integrateNativeRegions, type CellRegion } from './native-region-integrals';
import { readNativeThickness } from './native-thickness';

/** One region × depth range: its integrated terms (mol C s-1) and inventory (mol C). */
export interface NativeBudgetCell {
  region: string;
  depthLimit: number | null;
  terms: BudgetTermSeries[];
  inventory: Float64Array | null;
}

/** Everything a regional budget needs from one file, read and checked. */
export interface NativeBudget {
  start: string;
  grid: NativeHorizontalGrid;
  thicknessSource: string;
  tendencyVariable: string;
  cells: NativeBudgetCell[];
}

// TODO(units): accept any carbon rate per volume once the shared unit parser reads "mol m-3 s-1" and kin.
const RATE_UNITS = new Set(['mol m-3 s-1', 'mol/m3/s', 'mol m-3 s^-1', 'mol.m-3.s-1']);
const CONCENTRATION_UNITS = new Set(['mol m-3', 'mol/m3', 'mol.m-3']);

/**
 * Reads the budget terms of `body` from one NetCDF file on its native grid and integrates each
 * over every region (from `regionsFor(grid)`) for each 0–H range and full depth. All terms must
 * share the tendency's dimensions (400 naming the one that does not) and be rates in mol m-3 s-1.
 */
export function computeNativeBudget(file: NetcdfFile, body: RegionalBudgetBody, regionsFor: (grid: NativeHorizontalGrid) => CellRegion[]): NativeBudget {
  const tendency = body.terms.find((t) => t.role === 'tendency')!;
  const tv = file.variable(tendency.variable);
  if (tv.dims.length !== 4) throw new BadRequestException(`${tv.name} has dimensions (${tv.dims.join(', ')}); budget terms are 3-D rates (time, level, y, x)`);
  for (const t of body.terms) {
    const v = file.variable(t.variable);
    if (v.dims.join() !== tv.dims.join() || v.shape.join() !== tv.shape.join()) {
      throw new BadRequestException(`${v.name} is on (${v.dims.join(', ')}) [${v.shape.join(' × ')}], not on the grid of ${tv.name} (${tv.dims.join(', ')}) [${tv.shape.join(' × ')}]`);
    }
    const units = (stringAttribute(v.attributes, 'units') ?? '').trim();
    if (!RATE_UNITS.has(units)) throw new BadRequestException(`${v.name} has units "${units}"; budget terms must be rates in mol m-3 s-1`);
  }
  const inv = body.inventoryVariable ? file.variable(body.inventoryVariable) : null;
  if (inv) {
    if (inv.dims.join() !== tv.dims.join() || inv.shape.join() !== tv.shape.join()) throw new BadRequestException(`${inv.name} is not on the grid of ${tv.name}`);
    const units = (stringAttribute(inv.attributes, 'units') ?? '').trim();
    if (!CONCENTRATION_UNITS.has(units)) throw new BadRequestException(`${inv.name} has units "${units}"; the inventory variable must be a concentration in mol m-3`);
  }
  const grid = readNativeHorizontalGrid(file, tv.name);
  const thickness = readNativeThickness(file, tv.name, grid);
  const regions = regionsFor(grid);
  const time = readMonthlyTime(file, tv.dims[0]);
  const limits = [...new Set(body.depthLimits)].sort((a, b) => a - b);
  const depthLimits: (number | null)[] = [...limits, null];
  const integrated = body.terms.map((t) => ({ t, series: integrateNativeRegions(file, t.variable, grid, thickness, regions, depthLimits) }));
  const inventory = inv ? integrateNativeRegions(file, inv.name, grid, thickness, regions, depthLimits) : null;
  const cells: NativeBudgetCell[] = [];
  let k = 0;
  for (const r of regions) {
    for (const h of depthLimits) {
      cells.push({
        region: r.name,
        depthLimit: h,
        terms: integrated.map(({ t, series }) => ({ role: t.role, name: t.variable, sign: t.sign as 1 | -1, values: series[k].values })),
        inventory: inventory ? inventory[k].values : null,
      });
      k++;
    }
  }
  return { start: time.axis.start, grid, thicknessSource: thickness.source, tendencyVariable: tv.name, cells };
}
