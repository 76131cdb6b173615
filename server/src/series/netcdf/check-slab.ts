import { NetcdfImportError } from './netcdf-import-error';
import type { Hyperslab, NcVariable } from './types';

/** The slab to read: the given one after bounds checks, or the whole variable. */
export function checkSlab(variable: NcVariable, slab?: Hyperslab): Hyperslab {
  if (!slab) return { start: variable.shape.map(() => 0), count: [...variable.shape] };
  const rank = variable.shape.length;
  if (slab.start.length !== rank || slab.count.length !== rank) {
    throw new NetcdfImportError('bad-slab', variable.name, `hyperslab of ${variable.name} needs ${rank} start and count values (dimensions ${variable.dims.join(', ')}), got ${slab.start.length} and ${slab.count.length}`);
  }
  for (let i = 0; i < rank; i++) {
    const s = slab.start[i];
    const c = slab.count[i];
    if (!Number.isInteger(s) || !Number.isInteger(c) || s < 0 || c < 0 || s + c > variable.shape[i]) {
      throw new NetcdfImportError('bad-slab', variable.name, `hyperslab start ${s}, count ${c} is outside dimension ${variable.dims[i]} of ${variable.name} (length ${variable.shape[i]})`);
    }
  }
  return slab;
}
