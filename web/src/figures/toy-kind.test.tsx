import { act, fireEvent, screen } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { createFigureRegistry, FIGURE_KINDS } from '@upwell/common';
import { recentMeanKind } from '../../../common/test-fixtures/toy-kind';
import { formKinds } from './form-kinds';
import { KIND_FIELDS } from './kinds';
import { RecipeForm } from './RecipeForm';
import { SERIES_ID, seriesSummary } from './test-data';
import { mockFetch, renderWithQuery } from './test-render';
import { RecentMeanFields } from './toy-kind-fields';

describe('a toy figure kind in the recipe form', () => {
  it('is offered with its label, shows its fields with the schema’s default and bounds, and saves its parsed recipe', async () => {
    mockFetch(() => ({ json: [] }));
    const kinds = formKinds(createFigureRegistry([...FIGURE_KINDS, recentMeanKind]), { ...KIND_FIELDS, 'recent-mean': RecentMeanFields });
    const onSave = vi.fn();
    renderWithQuery(<RecipeForm initial={null} series={[seriesSummary()]} onSave={onSave} kinds={kinds} />);
    fireEvent.change(screen.getByLabelText('What the figure shows'), { target: { value: 'recent-mean' } });
    expect(screen.getByRole('option', { name: 'Mean of the last months' })).toBeTruthy();
    const months = screen.getByLabelText('Last months') as HTMLInputElement;
    expect([months.value, months.min, months.max]).toEqual(['12', '1', '120']);
    fireEvent.change(screen.getByLabelText('Series'), { target: { value: SERIES_ID } });
    fireEvent.change(months, { target: { value: '6' } });
    await act(async () => {
      fireEvent.submit(screen.getByRole('form', { name: 'Figure settings' }));
    });
    expect(onSave).toHaveBeenCalledWith({ kind: 'recent-mean', series: { seriesId: SERIES_ID, version: 'latest' }, months: 6 });
  });
});
