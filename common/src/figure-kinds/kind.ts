/**
 * What a figure kind is: one folder under figure-kinds/ defines it with `defineFigureKind`. The
 * registry (registry.ts) lists the kinds; the server adds one compute file per kind
 * (server/src/figures/recipes/<kind>.ts) and the web one form-fields file
 * (web/src/figures/kinds/<kind>.tsx).
 */
import type { z } from 'zod';
import type { UsedSeries } from './shared/result-parts';
import type { FigureSpec } from './shared/spec-type';

/** One cell of a figure's CSV table. */
export type TableCell = string | number | null | undefined;

/** A figure's data as one table: the header and the rows (CSV export). */
export interface FigureTable {
  header: string[];
  rows: TableCell[][];
}

/** What a spec builder knows besides the data: the versions used (for axis names). */
export interface SpecContext {
  used: UsedSeries[];
}

/**
 * A figure kind. `recipe` holds the recipe's defaults and bounds (nowhere else); `result` is the
 * one shape of the figure's data, from the server's compute to the chart; `skeleton` is what the
 * schema cannot default (empty bindings, a first budget term), from which forms start.
 */
export interface FigureKindDefinition<K extends string = string, R extends z.ZodObject = z.ZodObject, D extends z.ZodType = z.ZodType> {
  kind: K;
  /** Words shown for the kind (menus, figure heads, file names). */
  label: string;
  recipe: R;
  skeleton: Record<string, unknown>;
  result: D;
  /** The chart as a vega-lite spec; null when the kind is drawn otherwise (the event table is an HTML table). */
  spec(data: z.output<D>, ctx: SpecContext): FigureSpec | null;
  /** The data as one table for CSV export. */
  table(data: z.output<D>): FigureTable;
}

/** Declares a figure kind, keeping its literal types for the registry. */
export function defineFigureKind<const K extends string, R extends z.ZodObject, D extends z.ZodType>(def: FigureKindDefinition<K, R, D>): FigureKindDefinition<K, R, D> {
  return def;
}
