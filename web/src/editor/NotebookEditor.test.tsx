import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import type { Editor } from '@tiptap/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import * as Y from 'yjs';
import { Fragment } from '@tiptap/pm/model';
import { DOCUMENT_FIELD } from '@upwell/common';
import { result, SERIES_ID, seriesSummary } from '../figures/test-data';
import { mockFetch, renderWithQuery } from '../figures/test-render';
import { NotebookEditor } from './NotebookEditor';

afterEach(() => vi.unstubAllGlobals());

const figureResult = result('timeseries', { points: [], events: [], units: 'Pg C', show: 'anomaly', trend: { perDecade: null, perDecadeStdErr: null, r2: null, n: 0 } }, {
  numbers: [{ key: 'trend', label: 'linear trend', value: -0.4213, units: 'Pg C decade⁻¹' }],
});

function setup(editable = true) {
  mockFetch((path) => ({ json: path.includes('/series') ? { items: [seriesSummary()], total: 1, page: 1, pageSize: 200 } : figureResult }));
  const doc = new Y.Doc();
  let editor: Editor | null = null;
  const view = renderWithQuery(<NotebookEditor notebookId="nb1" groupId="g1" doc={doc} editable={editable} onReady={(e) => (editor = e)} />);
  // The shared Yjs document as text (Yjs writes element names in lower case, attributes as JSON).
  const xml = () => doc.getXmlFragment(DOCUMENT_FIELD).toString() + doc.getXmlFragment(DOCUMENT_FIELD).toArray().map((n) => JSON.stringify(n instanceof Y.XmlElement ? n.getAttributes() : {})).join('');
  const sharedFigures = () => doc.getXmlFragment(DOCUMENT_FIELD).toArray().filter((n): n is Y.XmlElement => n instanceof Y.XmlElement && n.nodeName === 'liveFigure');
  return { doc, xml, sharedFigures, editor: () => editor!, ...view };
}

describe('NotebookEditor', () => {
  it('gives every toolbar control an accessible name', () => {
    setup();
    const toolbar = screen.getByRole('toolbar', { name: 'Writing tools' });
    const buttons = [...toolbar.querySelectorAll('button')];
    expect(buttons.length).toBeGreaterThanOrEqual(13);
    for (const b of buttons) expect(b.getAttribute('aria-label')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Insert figure' }).getAttribute('title')).toMatch(/Ctrl\+Alt\+F.*\/figure/);
  });

  it('inserts a figure into the shared document with a fresh id, numbered and with its settings open', async () => {
    const { sharedFigures } = setup();
    fireEvent.click(screen.getByRole('button', { name: 'Insert figure' }));
    await screen.findByRole('figure', { name: 'Figure 1' });
    expect(sharedFigures()).toHaveLength(1);
    expect(sharedFigures()[0].getAttribute('id')).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/);
    expect(screen.getByRole('form', { name: 'Figure settings' })).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Insert figure' }));
    await screen.findByRole('figure', { name: 'Figure 2' });
    expect(sharedFigures()[0].getAttribute('id')).not.toBe(sharedFigures()[1].getAttribute('id'));
  });

  it('inserts a figure with Mod-Alt-f and from "/figure" then Enter', async () => {
    const { xml, editor } = setup();
    await waitFor(() => expect(editor()).toBeTruthy());
    const dom = editor().view.dom;
    act(() => {
      editor().commands.focus();
    });
    fireEvent.keyDown(dom, { key: 'f', code: 'KeyF', keyCode: 70, ctrlKey: true, altKey: true });
    expect(xml().match(/<livefigure/g)).toHaveLength(1);
    act(() => {
      editor().chain().focus('end').insertContent({ type: 'paragraph', content: [{ type: 'text', text: 'See /figure' }] }).run();
    });
    fireEvent.keyDown(dom, { key: 'Enter', code: 'Enter', keyCode: 13 });
    expect(xml().match(/<livefigure/g)).toHaveLength(2);
    expect(xml()).toContain('See ');
    expect(xml()).not.toContain('/figure');
  });

  it('saving a figure’s settings writes the recipe into the node, and its numbers can be inserted from the picker', async () => {
    const { xml, editor } = setup();
    fireEvent.click(screen.getByRole('button', { name: 'Insert figure' }));
    await screen.findAllByRole('option', { name: /DIC 0–100 m/ });
    fireEvent.change(screen.getByLabelText('Series'), { target: { value: SERIES_ID } });
    fireEvent.submit(screen.getByRole('form', { name: 'Figure settings' }));
    await waitFor(() => expect(xml()).toContain(SERIES_ID));
    const fig = editor().state.doc.firstChild!;
    expect(fig.attrs.recipe).toMatchObject({ kind: 'timeseries', series: { seriesId: SERIES_ID, version: 'latest' } });

    fireEvent.keyDown(editor().view.dom, { key: 'n', code: 'KeyN', keyCode: 78, ctrlKey: true, altKey: true });
    const choice = await screen.findByRole('radio', { name: /linear trend/ });
    fireEvent.click(choice);
    fireEvent.change(screen.getByLabelText('Decimal places'), { target: { value: '1' } });
    fireEvent.click(screen.getByRole('button', { name: 'Insert number' }));
    await waitFor(() => expect(xml()).toContain('<livenumber'));
    let number: Record<string, unknown> | null = null;
    editor().state.doc.descendants((n) => {
      if (n.type.name === 'liveNumber') number = n.attrs;
    });
    expect(number).toMatchObject({ key: 'trend', precision: 1, figureId: fig.attrs.id, recipe: fig.attrs.recipe });
    const live = await screen.findByRole('button', { name: /Live number: linear trend/ });
    await waitFor(() => expect(live.textContent).toBe('−0.4\u00a0Pg C decade⁻¹'));

    // The number follows its figure when the figure's settings change.
    fireEvent.click(screen.getByRole('button', { name: 'Figure 1 settings' }));
    fireEvent.change(await screen.findByLabelText('Version of series'), { target: { value: '2' } });
    fireEvent.submit(screen.getByRole('form', { name: 'Figure settings' }));
    const numberRecipe = () => {
      let r: unknown = null;
      editor().state.doc.descendants((n) => {
        if (n.type.name === 'liveNumber') r = n.attrs.recipe;
      });
      return r as { series: { version: unknown } } | null;
    };
    await waitFor(() => expect(numberRecipe()?.series.version).toBe(2));
    let figureVersion: unknown = null;
    editor().state.doc.descendants((n) => {
      if (n.type.name === 'liveFigure') figureVersion = n.attrs.recipe.series.version;
    });
    expect(figureVersion).toBe(2);
  });

  it('undoes the person’s own change through Yjs with Mod-z', async () => {
    const { xml, editor } = setup();
    await waitFor(() => expect(editor()).toBeTruthy());
    act(() => {
      editor().chain().focus().insertContent('Carbon left the upper ocean.').run();
    });
    expect(xml()).toContain('Carbon left');
    fireEvent.keyDown(editor().view.dom, { key: 'z', code: 'KeyZ', keyCode: 90, ctrlKey: true });
    expect(xml()).not.toContain('Carbon left');
  });

  it('is read-only for reviewers and readers: no toolbar, no settings, figures still shown', async () => {
    const doc = new Y.Doc();
    mockFetch(() => ({ json: figureResult }));
    // Content written by an author elsewhere, arriving through the shared document.
    const fragment = doc.getXmlFragment(DOCUMENT_FIELD);
    const figure = new Y.XmlElement('liveFigure');
    figure.setAttribute('id', 'f1');
    figure.setAttribute('caption', 'DIC anomaly');
    figure.setAttribute('recipe', { kind: 'timeseries', series: { seriesId: SERIES_ID, version: 'latest' } } as unknown as string);
    fragment.insert(0, [figure]);
    let editor: Editor | null = null;
    renderWithQuery(<NotebookEditor notebookId="nb1" groupId="g1" doc={doc} editable={false} onReady={(e) => (editor = e)} />);
    await screen.findByRole('figure', { name: 'Figure 1' });
    expect(screen.queryByRole('toolbar')).toBeNull();
    expect(screen.queryByRole('button', { name: /settings/ })).toBeNull();
    expect(screen.queryByLabelText(/Caption of/)).toBeNull();
    expect(editor!.isEditable).toBe(false);
    expect(screen.getByText('DIC anomaly')).toBeTruthy();
  });
});

describe('pasting a figure', () => {
  it('gives the pasted copy a new id', async () => {
    const { freshFigureIds } = await import('./extensions');
    const { upwellSchema } = await import('@upwell/common');
    const schema = upwellSchema();
    const fig = schema.nodes.liveFigure.create({ id: 'f1', recipe: null, caption: 'c' });
    const quote = schema.nodes.blockquote.create(null, [schema.nodes.liveFigure.create({ id: 'f2', recipe: null, caption: '' })]);
    const out = freshFigureIds(Fragment.from([fig, quote]));
    const ids: string[] = [];
    out.descendants((n) => {
      if (n.type.name === 'liveFigure') ids.push(n.attrs.id);
    });
    expect(ids).toHaveLength(2);
    expect(ids).not.toContain('f1');
    expect(ids).not.toContain('f2');
    expect(out.firstChild!.attrs.caption).toBe('c');
  });
});
