import type { FigureRecipe, FigureResult } from '../../api/figures';
import type { FigureSpec } from './spec-type';
import { readFigureData } from '../figure-data';
import { budgetSpec } from './budget';
import { compositeSpec } from './composite';
import { hovmollerSpec } from './hovmoller';
import { lagCorrelationSpec } from './lag-correlation';
import { scatterSpec } from './scatter';
import { seasonalCycleSpec } from './seasonal-cycle';
import { timeseriesSpec } from './timeseries';

/** The chart of a computed recipe; null for the event table, which is an HTML table. */
export function specForResult(recipe: FigureRecipe, result: Pick<FigureResult, 'data' | 'used'>): FigureSpec | null {
  switch (recipe.kind) {
    case 'timeseries':
      return timeseriesSpec(readFigureData('timeseries', result), recipe);
    case 'seasonal-cycle':
      return seasonalCycleSpec(readFigureData('seasonal-cycle', result), recipe);
    case 'lag-correlation':
      return lagCorrelationSpec(readFigureData('lag-correlation', result), recipe);
    case 'composite':
      return compositeSpec(readFigureData('composite', result), recipe);
    case 'budget':
      return budgetSpec(readFigureData('budget', result), recipe);
    case 'hovmoller':
      return hovmollerSpec(readFigureData('hovmoller', result), recipe);
    case 'scatter':
      return scatterSpec(readFigureData('scatter', result), recipe);
    case 'event-table':
      return null;
  }
}
