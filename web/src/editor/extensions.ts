import { Extension, type AnyExtension } from '@tiptap/core';
import Collaboration from '@tiptap/extension-collaboration';
import CollaborationCaret from '@tiptap/extension-collaboration-caret';
import { Fragment, Slice, type Node as PMNode } from '@tiptap/pm/model';
import { Plugin, PluginKey } from '@tiptap/pm/state';
import { ReactNodeViewRenderer } from '@tiptap/react';
import { DOCUMENT_FIELD, LIVE_FIGURE, LIVE_NUMBER, LiveFigure, LiveNumber, upwellDocumentExtensions } from '@upwell/common';
import type * as Y from 'yjs';
import { insertFigure, typedTriggerBefore } from './commands';
import { selectLiveNodeInTheWay } from './guard-live-nodes';
import { LiveFigureNodeView } from './LiveFigureNodeView';
import { LiveNumberNodeView } from './LiveNumberNodeView';

/** The live figure with its React node view (same attributes as the server's schema). */
export const LiveFigureWithView = LiveFigure.extend({
  addNodeView() {
    return ReactNodeViewRenderer(LiveFigureNodeView);
  },
  addProseMirrorPlugins() {
    // A pasted figure is a new figure: it gets its own id, so comments and numbers stay with the original.
    return [new Plugin({ key: new PluginKey('upwellFigureIds'), props: { transformPasted: (slice) => new Slice(freshFigureIds(slice.content), slice.openStart, slice.openEnd) } })];
  },
});

/** The fragment with every live figure given a new id. */
export function freshFigureIds(fragment: Fragment): Fragment {
  const nodes: PMNode[] = [];
  fragment.forEach((node) => {
    if (node.type.name === LIVE_FIGURE) nodes.push(node.type.create({ ...node.attrs, id: crypto.randomUUID() }, node.content, node.marks));
    else nodes.push(node.copy(freshFigureIds(node.content)));
  });
  return Fragment.fromArray(nodes);
}

/** The live number with its React node view (inline). */
export const LiveNumberWithView = LiveNumber.extend({
  addNodeView() {
    return ReactNodeViewRenderer(LiveNumberNodeView, { as: 'span' });
  },
});

export interface UpwellShortcutOptions {
  /** Opens the live-number picker (the number needs a choice before it can be inserted). */
  onInsertNumber: () => void;
}

/**
 * Upwell's own typed shortcuts: Mod-Alt-f inserts a figure, Mod-Alt-n a live
 * number; "/figure" or "/number" then Enter does the same from the text.
 */
export const UpwellShortcuts = Extension.create<UpwellShortcutOptions>({
  name: 'upwellShortcuts',
  priority: 1000,
  addOptions() {
    return { onInsertNumber: () => {} };
  },
  addKeyboardShortcuts() {
    return {
      'Mod-Alt-f': () => this.editor.isEditable && insertFigure(this.editor),
      'Mod-Alt-n': () => {
        if (!this.editor.isEditable) return false;
        this.options.onInsertNumber();
        return true;
      },
      // A stray key next to a live figure or number selects it; only a second, explicit press deletes it.
      Backspace: () => this.editor.isEditable && selectLiveNodeInTheWay(this.editor.state, this.editor.view.dispatch, 'backward'),
      Delete: () => this.editor.isEditable && selectLiveNodeInTheWay(this.editor.state, this.editor.view.dispatch, 'forward'),
      Enter: () => {
        if (!this.editor.isEditable) return false;
        const trigger = typedTriggerBefore(this.editor);
        if (!trigger) return false;
        this.editor.chain().deleteRange({ from: trigger.from, to: trigger.to }).run();
        if (trigger.which === 'figure') return insertFigure(this.editor);
        this.options.onInsertNumber();
        return true;
      },
    };
  },
});

/** Who is typing, for other people's carets; the provider carries presence (awareness) to them. */
export interface PresenceOptions {
  provider: { awareness: unknown };
  user: { id: string; name: string; color: string };
}

/** The editor's extensions: the shared document schema with our node views, Yjs binding, carets of others and shortcuts. */
export function notebookEditorExtensions(doc: Y.Doc, shortcuts: UpwellShortcutOptions, presence?: PresenceOptions): AnyExtension[] {
  const shared = upwellDocumentExtensions().map((ext) => (ext.name === LIVE_FIGURE ? LiveFigureWithView : ext.name === LIVE_NUMBER ? LiveNumberWithView : ext));
  const carets = presence ? [CollaborationCaret.configure({ provider: presence.provider, user: presence.user })] : [];
  return [...shared, Collaboration.configure({ document: doc, field: DOCUMENT_FIELD }), ...carets, UpwellShortcuts.configure(shortcuts)];
}
