import type { FigureDataOf, FigureKind, FigureNumber, UsedSeries } from '@upwell/common';

/** A bound series resolved to one version, with its values. */
export interface LoadedSeries extends UsedSeries {
  start: string;
  values: (number | null)[];
}

/** A saved event set as a recipe uses it. */
export interface LoadedEventSet {
  id: string;
  name: string;
  updatedAt: string;
  events: { phase: 'warm' | 'cold'; start: string; peak: string; end: string; label: string }[];
}

/** A stored zonal mean (time × latitude) as the Hovmöller recipe uses it. */
export interface LoadedZonalField {
  used: UsedSeries;
  start: string;
  latitudes: number[];
  /** Time-major rows, one per month, one value per latitude. */
  rows: (number | null)[][];
}

/** Everything a recipe computes from, resolved and checked by the service. */
export interface RecipeInputs {
  /** The series of each binding, by its path in the recipe ("index", "carbon.0", "terms.1.series"). */
  series: Map<string, LoadedSeries>;
  eventSet: LoadedEventSet | null;
  zonalField: LoadedZonalField | null;
}

/** A binding of a recipe with the path that names it in messages. */
export interface NamedBinding {
  path: string;
  seriesId: string;
  version: 'latest' | number;
}

/** What a recipe gives back: exactly its kind's data; the service adds used, cautions about origin, key and engine version. */
export interface RecipeOutput<K extends FigureKind = FigureKind> {
  data: FigureDataOf<K>;
  numbers: FigureNumber[];
  methods: string;
  cautions: string[];
  warnings: string[];
}
