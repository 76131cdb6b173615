import { Editor } from '@tiptap/core';
import Collaboration from '@tiptap/extension-collaboration';
import { NodeSelection, TextSelection } from '@tiptap/pm/state';
import { afterEach, describe, expect, it } from 'vitest';
import * as Y from 'yjs';
import { DOCUMENT_FIELD, upwellDocumentExtensions } from '@upwell/common';
import { anchorFromSelection, anchorToRange } from './anchor';

const editors: Editor[] = [];
afterEach(() => editors.splice(0).forEach((e) => e.destroy()));

/** A Tiptap editor bound to `doc` as the notebook editor binds it. */
function boundEditor(doc: Y.Doc): Editor {
  const editor = new Editor({ element: document.createElement('div'), extensions: [...upwellDocumentExtensions(), Collaboration.configure({ document: doc, field: DOCUMENT_FIELD })] });
  editors.push(editor);
  return editor;
}

/** A document with one paragraph, as stored on the server. */
function docWith(text: string): Y.Doc {
  const doc = new Y.Doc();
  const p = new Y.XmlElement('paragraph');
  p.insert(0, [new Y.XmlText(text)]);
  doc.getXmlFragment(DOCUMENT_FIELD).insert(0, [p]);
  return doc;
}

function select(editor: Editor, word: string) {
  let at = -1;
  editor.state.doc.descendants((node, pos) => {
    if (at < 0 && node.isText && node.text!.includes(word)) at = pos + node.text!.indexOf(word);
  });
  editor.view.dispatch(editor.state.tr.setSelection(TextSelection.create(editor.state.doc, at, at + word.length)));
}

describe('comment anchors from the editor selection', () => {
  it('anchors the selected words and finds them again after another replica types before them', () => {
    const doc = docWith('Outgassing weakened in the eastern Pacific.');
    const editor = boundEditor(doc);
    select(editor, 'eastern');
    const anchor = anchorFromSelection(editor);
    expect(anchor).toMatchObject({ type: 'text', quote: 'eastern' });

    // Someone else, on their own copy, writes before the passage; their update reaches us.
    const other = new Y.Doc();
    Y.applyUpdate(other, Y.encodeStateAsUpdate(doc));
    const text = (other.getXmlFragment(DOCUMENT_FIELD).get(0) as Y.XmlElement).get(0) as Y.XmlText;
    text.insert(0, 'During the 1997–98 event, ');
    Y.applyUpdate(doc, Y.encodeStateAsUpdate(other, Y.encodeStateVector(doc)));
    expect(editor.state.doc.textContent).toContain('During the 1997–98 event');

    const range = anchorToRange(editor, anchor!)!;
    expect(editor.state.doc.textBetween(range.from, range.to)).toBe('eastern');
  });

  it('has no anchor for an empty selection, and loses the range once the passage is deleted', () => {
    const editor = boundEditor(docWith('Uptake rose in the west.'));
    expect(anchorFromSelection(editor)).toBeNull();
    select(editor, 'rose');
    const anchor = anchorFromSelection(editor)!;
    const range = anchorToRange(editor, anchor)!;
    editor.view.dispatch(editor.state.tr.delete(range.from, range.to));
    expect(anchorToRange(editor, anchor)).toBeNull();
  });

  it('anchors a selected figure by its id and finds its node', () => {
    const editor = boundEditor(new Y.Doc());
    editor.commands.setContent({
      type: 'doc',
      content: [
        { type: 'paragraph', content: [{ type: 'text', text: 'Before.' }] },
        { type: 'liveFigure', attrs: { id: 'fig-1', caption: 'Composite DIC anomaly', recipe: null } },
      ],
    });
    let pos = -1;
    editor.state.doc.descendants((n, p) => {
      if (n.type.name === 'liveFigure') pos = p;
    });
    editor.view.dispatch(editor.state.tr.setSelection(NodeSelection.create(editor.state.doc, pos)));
    const anchor = anchorFromSelection(editor);
    expect(anchor).toEqual({ type: 'figure', figureId: 'fig-1', quote: 'Composite DIC anomaly' });
    expect(anchorToRange(editor, anchor!)).toEqual({ from: pos, to: pos + 1 });
  });
});
