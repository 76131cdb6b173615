import type { FigureKind } from '@upwell/common';
import { budgetRecipe } from './budget';
import { compositeRecipe } from './composite';
import { eventTableRecipe } from './event-table';
import { hovmollerRecipe } from './hovmoller';
import { lagCorrelationRecipe } from './lag-correlation';
import type { FigureRecipeHandler } from './recipe';
import { scatterRecipe } from './scatter';
import { seasonalCycleRecipe } from './seasonal-cycle';
import { timeseriesRecipe } from './timeseries';

/** Every figure kind's handler, by kind: the one place a new kind is registered. */
export const RECIPES: { [K in FigureKind]: FigureRecipeHandler<K> } = {
  timeseries: timeseriesRecipe,
  'seasonal-cycle': seasonalCycleRecipe,
  'lag-correlation': lagCorrelationRecipe,
  composite: compositeRecipe,
  'event-table': eventTableRecipe,
  budget: budgetRecipe,
  hovmoller: hovmollerRecipe,
  scatter: scatterRecipe,
};
