import { Editor } from '@tiptap/core';
import { NodeSelection, TextSelection } from '@tiptap/pm/state';
import { LIVE_FIGURE, upwellDocumentExtensions } from '@upwell/common';
import { afterEach, describe, expect, it } from 'vitest';
import { UpwellShortcuts } from './extensions';

// The rule checked here is ProseMirror's own key handling (prosemirror-commands joinBackward/deleteSelection):
// without the guard, Backspace at the start of the paragraph below a figure deletes the figure (issue 18 item 1).
let editor: Editor | null = null;
afterEach(() => editor?.destroy());

function make() {
  editor = new Editor({
    extensions: [...upwellDocumentExtensions(), UpwellShortcuts],
    content: { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Above' }] }, { type: LIVE_FIGURE, attrs: { id: 'f1' } }, { type: 'paragraph', content: [{ type: 'text', text: 'Below' }] }] },
  });
  return editor;
}
const figures = (e: Editor) => { let n = 0; e.state.doc.descendants((node) => { if (node.type.name === LIVE_FIGURE) n++; }); return n; };
function press(e: Editor, key: string) {
  e.view.someProp('handleKeyDown', (f) => f(e.view, new KeyboardEvent('keydown', { key })));
}

describe('stray Backspace/Delete beside a live figure', () => {
  it('first Backspace at the start of the paragraph below selects the figure; the second deletes it', () => {
    const e = make();
    const below = e.state.doc.child(0).nodeSize + e.state.doc.child(1).nodeSize + 1;
    e.view.dispatch(e.state.tr.setSelection(TextSelection.create(e.state.doc, below)));
    press(e, 'Backspace');
    expect(figures(e)).toBe(1);
    expect(e.state.selection instanceof NodeSelection && e.state.selection.node.type.name).toBe(LIVE_FIGURE);
    press(e, 'Backspace');
    expect(figures(e)).toBe(0);
  });

  it('Delete at the end of the paragraph above selects the figure instead of removing it', () => {
    const e = make();
    e.view.dispatch(e.state.tr.setSelection(TextSelection.create(e.state.doc, 1 + 'Above'.length)));
    press(e, 'Delete');
    expect(figures(e)).toBe(1);
    expect(e.state.selection instanceof NodeSelection && e.state.selection.node.type.name).toBe(LIVE_FIGURE);
  });

  it('leaves ordinary Backspace inside text alone', () => {
    const e = make();
    e.view.dispatch(e.state.tr.setSelection(TextSelection.create(e.state.doc, 3)));
    press(e, 'Backspace');
    expect(figures(e)).toBe(1);
    expect(e.state.selection instanceof NodeSelection).toBe(false);
  });
});
