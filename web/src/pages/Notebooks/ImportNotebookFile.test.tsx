import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { MemoryRouter } from 'react-router';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { mockFetch, renderWithQuery } from '../../figures/test-render';
import { ImportNotebookFile } from './ImportNotebookFile';

// The 400 below has the shape the import route answers (server/test/notebook-files.e2e.spec.ts checks the server side).
afterEach(() => vi.unstubAllGlobals());

const fileOf = (text: string, name = 'event-analysis.upwell.json') => new File([text], name, { type: 'application/json' });

describe('ImportNotebookFile', () => {
  it('sends the chosen file as the body and lists every series the group lacks, by name', async () => {
    const fetch = mockFetch(() => ({
      status: 400,
      json: {
        statusCode: 400,
        error: 'Bad Request',
        message: 'the file’s data could not be matched in this group: …',
        issues: [
          { path: 'series.1.name', message: 'no series named “DIC inventory 0–100 m” in this group' },
          { path: 'fields.0.name', message: 'no zonal-mean field named “Surface DIC, zonal mean 20°S–20°N” in this group' },
        ],
      },
    }));
    renderWithQuery(
      <MemoryRouter>
        <ImportNotebookFile groupId="g1" />
      </MemoryRouter>,
    );
    const file = { format: 'upwell-notebook', formatVersion: 1, title: 'T' };
    fireEvent.change(screen.getByLabelText('Notebook file to import'), { target: { files: [fileOf(JSON.stringify(file))] } });
    const list = await screen.findByRole('list', { name: 'Missing series' });
    expect(within(list).getAllByRole('listitem').map((li) => li.textContent)).toEqual([
      'no series named “DIC inventory 0–100 m” in this group',
      'no zonal-mean field named “Surface DIC, zonal mean 20°S–20°N” in this group',
    ]);
    expect(fetch).toHaveBeenCalledTimes(1);
    const [url, init] = fetch.mock.calls[0] as unknown as [string, RequestInit];
    expect([url, init.method, JSON.parse(String(init.body))]).toEqual(['/api/groups/g1/notebooks/import', 'POST', file]);
  });

  it('refuses a file that is not JSON without asking the server', async () => {
    const fetch = mockFetch(() => ({ json: {} }));
    renderWithQuery(
      <MemoryRouter>
        <ImportNotebookFile groupId="g1" />
      </MemoryRouter>,
    );
    fireEvent.change(screen.getByLabelText('Notebook file to import'), { target: { files: [fileOf('not json {', 'notes.txt')] } });
    await waitFor(() => expect(screen.getByRole('alert').textContent).toContain('“notes.txt” is not a notebook file: it is not JSON'));
    expect(fetch).not.toHaveBeenCalled();
  });
});
