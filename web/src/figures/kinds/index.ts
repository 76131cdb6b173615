import type { ComponentType } from 'react';
import type { FigureKind } from '@upwell/common';
import type { KindFieldsProps } from '../form-fields';
import { BudgetFields } from './budget';
import { CompositeFields } from './composite';
import { EventTableFields } from './event-table';
import { HovmollerFields } from './hovmoller';
import { LagCorrelationFields } from './lag-correlation';
import { ScatterFields } from './scatter';
import { SeasonalCycleFields } from './seasonal-cycle';
import { TimeseriesFields } from './timeseries';

/** The form fields of each figure kind; the compiler asks for a line here when common's registry gains a kind. */
export const KIND_FIELDS: { [K in FigureKind]: ComponentType<KindFieldsProps> } = {
  timeseries: TimeseriesFields,
  'seasonal-cycle': SeasonalCycleFields,
  'lag-correlation': LagCorrelationFields,
  composite: CompositeFields,
  'event-table': EventTableFields,
  budget: BudgetFields,
  hovmoller: HovmollerFields,
  scatter: ScatterFields,
};

/** Which fields a form shows for each kind it offers (a toy kind in a test brings its own). */
export type KindFieldsTable = Record<string, ComponentType<KindFieldsProps>>;
