import { Theme } from '@radix-ui/themes';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { UploadPreview } from '@upwell/common';
import { ImportMapping } from './ImportMapping';

const preview: UploadPreview = {
  uploadId: '00000000-0000-4000-8000-000000000001',
  fileName: 'sector.csv',
  size: 2048,
  sha256: 'a'.repeat(64),
  format: 'csv',
  netcdf: null,
  csv: {
    delimiter: 'comma',
    decimalSeparator: 'point',
    encoding: 'utf-8',
    header: ['date', 'index_anomaly', 'flux'],
    headerLine: 1,
    linesBeforeHeader: 0,
    layout: { kind: 'long', dateColumns: ['date'], dateFormat: 'iso' },
    rows: [['1997-01', '0.5', '0.3']],
    rowCount: 1,
    series: [
      { column: 'index_anomaly', start: '1997-01', values: [0.5], missingCount: 0, suggestedName: 'index anomaly' },
      { column: 'flux', start: '1997-01', values: [0.3], missingCount: 0, suggestedName: 'flux', suggestedUnits: 'PgC/yr' },
    ],
    warnings: [{ code: 'gap', message: 'one month is missing and was left empty' }],
  },
};

function renderMapping(onDone = vi.fn()) {
  const qc = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <Theme>
      <QueryClientProvider client={qc}>
        <ImportMapping groupId="g1" preview={preview} onDone={onDone} onDiscard={() => {}} />
      </QueryClientProvider>
    </Theme>,
  );
  return onDone;
}

afterEach(() => vi.unstubAllGlobals());

describe('ImportMapping', () => {
  it('shows what was read: warnings, the rows and one mapping row per column with suggested names and units', () => {
    vi.stubGlobal('fetch', vi.fn(async () => new Response(JSON.stringify({ items: [], total: 0, page: 1, pageSize: 200 }), { status: 200 })));
    renderMapping();
    expect(screen.getByText('one month is missing and was left empty')).toBeTruthy();
    expect((screen.getByLabelText('Name for index_anomaly') as HTMLInputElement).value).toBe('index anomaly');
    expect((screen.getByLabelText('Units for flux') as HTMLInputElement).value).toBe('PgC/yr');
  });

  it('sends the mapping the researcher edited, leaving out unticked columns', async () => {
    const calls: { url: string; body: unknown }[] = [];
    vi.stubGlobal(
      'fetch',
      vi.fn(async (url: string, init?: RequestInit) => {
        calls.push({ url, body: init?.body ? JSON.parse(String(init.body)) : undefined });
        if (url.includes('/import')) return new Response(JSON.stringify({ series: [{ id: 's1', name: 'Sector index', version: 1, created: true }], fields: [] }), { status: 200 });
        return new Response(JSON.stringify({ items: [], total: 0, page: 1, pageSize: 200 }), { status: 200 });
      }),
    );
    const onDone = renderMapping();
    fireEvent.change(screen.getByLabelText('Name for index_anomaly'), { target: { value: 'Sector index' } });
    fireEvent.click(screen.getByLabelText('Store column flux'));
    fireEvent.click(screen.getByRole('button', { name: 'Store selected series' }));
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    const sent = calls.find((c) => c.url.includes('/import'))!;
    expect(sent.url).toBe(`/api/uploads/${preview.uploadId}/import`);
    expect(sent.body).toMatchObject({
      origin: 'unspecified',
      columns: [
        { column: 'index_anomaly', skip: false, name: 'Sector index', kind: 'other', variable: 'index_anomaly' },
        { column: 'flux', skip: true },
      ],
    });
    expect(onDone.mock.calls[0][0]).toContain('Stored Sector index (version 1)');
  });
});
