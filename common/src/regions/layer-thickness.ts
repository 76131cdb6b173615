import { metresPerVerticalUnit } from './vertical-length-unit';

/** The layers of a vertical axis as depths below the surface, in metres, positive down. */
export interface Layers {
  /** Depth of the top of each layer, m. */
  top: Float64Array;
  /** Depth of the bottom of each layer, m. */
  bottom: Float64Array;
  /** bottom − top, m. */
  thickness: Float64Array;
}

/**
 * Layers from a CF bounds variable (`depth_bnds`, `lev_bnds`: n × 2, row-major) of a vertical
 * coordinate with its `units` and `positive` attribute (CF 1.11 §4.3: "up" means values grow
 * upward, so heights −5, −15 are depths 5, 15). Either bound may come first. Throws RangeError
 * naming the problem for an odd-length bounds array, a unit that is not a length, or layers that
 * overlap or have no thickness.
 */
export function layersFromBounds(bounds: ArrayLike<number>, units: string | undefined, positive: 'up' | 'down'): Layers {
  const toMetres = metresPerVerticalUnit(units);
  if (toMetres === null) throw new RangeError(`the vertical bounds have units "${units ?? ''}", not a length (m, cm, centimeters)`);
  if (bounds.length === 0 || bounds.length % 2 !== 0) throw new RangeError(`vertical bounds need 2 values per layer, got ${bounds.length}`);
  const n = bounds.length / 2;
  const sign = positive === 'up' ? -1 : 1;
  const top = new Float64Array(n);
  const bottom = new Float64Array(n);
  const thickness = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const a = sign * bounds[2 * k] * toMetres;
    const b = sign * bounds[2 * k + 1] * toMetres;
    top[k] = Math.min(a, b) + 0; // + 0 turns the −0 of a negated surface bound into 0
    bottom[k] = Math.max(a, b);
    thickness[k] = bottom[k] - top[k];
    if (!(thickness[k] > 0)) throw new RangeError(`vertical layer ${k} has no thickness (bounds ${bounds[2 * k]}, ${bounds[2 * k + 1]})`);
    if (k > 0 && Math.max(top[k], top[k - 1]) < Math.min(bottom[k], bottom[k - 1]) - 1e-9 * thickness[k]) {
      throw new RangeError(`vertical layers ${k - 1} and ${k} overlap`);
    }
  }
  return { top, bottom, thickness };
}
