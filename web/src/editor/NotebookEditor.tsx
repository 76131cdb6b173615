import { EditorContent, useEditor, type Editor } from '@tiptap/react';
import { useEffect, useMemo, useRef, useState } from 'react';
import type * as Y from 'yjs';
import { insertLiveNumber } from './commands';
import { notebookEditorExtensions, type PresenceOptions } from './extensions';
import { createFigureIndex } from './figure-index';
import { NotebookEditorContext, type PresenceAwareness } from './notebook-context';
import { NumberPicker } from './NumberPicker';
import { Toolbar } from './Toolbar';
import './editor.css';

/** Props of the notebook editor. */
export interface NotebookEditorProps {
  notebookId: string;
  groupId: string;
  /** The notebook's shared document; its content arrives through the collaboration provider, never as `content`. */
  doc: Y.Doc;
  /** False for reviewers and readers: the text, figures and numbers show, nothing changes. */
  editable: boolean;
  onReady?: (editor: Editor) => void;
  /** Presence of the live transport, for other people's carets and selections. */
  presence?: PresenceOptions;
}

/**
 * The notebook's manuscript: rich text with live figures and live numbers,
 * co-edited through Yjs (undo is the Yjs binding's own, so it undoes only
 * this person's changes).
 */
export function NotebookEditor({ notebookId, groupId, doc, editable, onReady, presence }: NotebookEditorProps) {
  const figures = useMemo(() => createFigureIndex(), []);
  const [picking, setPicking] = useState(false);
  const onReadyRef = useRef(onReady);
  onReadyRef.current = onReady;
  const openPicker = useRef(() => setPicking(true));

  const editor = useEditor(
    {
      // No `content`: the Y.Doc is the source of the document (see toolchain.md).
      extensions: notebookEditorExtensions(doc, { onInsertNumber: () => openPicker.current() }, presence),
      editable,
      editorProps: {
        attributes: { class: 'upwell-document-body', 'aria-label': 'Notebook text', role: 'textbox', 'aria-multiline': 'true' },
      },
      onCreate: ({ editor: e }) => {
        figures.update(e.state.doc);
        onReadyRef.current?.(e);
      },
      onUpdate: ({ editor: e }) => figures.update(e.state.doc),
    },
    [doc],
  );

  useEffect(() => {
    if (editor && editor.isEditable !== editable) editor.setEditable(editable);
  }, [editor, editable]);

  const awareness = presence?.provider.awareness as PresenceAwareness | undefined;
  const context = useMemo(() => ({ notebookId, groupId, editable, figures, awareness }), [notebookId, groupId, editable, figures, awareness]);

  return (
    <NotebookEditorContext.Provider value={context}>
      <div className={`upwell-editor${editable ? '' : ' is-read-only'}`}>
        {editable && editor && <Toolbar editor={editor} onInsertNumber={() => setPicking(true)} />}
        {!editable && (
          <p className="upwell-read-only-note" role="note">
            You are reading this notebook; figures and numbers stay live, the text cannot be changed here.
          </p>
        )}
        <EditorContent editor={editor} className="upwell-document" />
        {editable && editor && (
          <NumberPicker
            open={picking}
            onOpenChange={setPicking}
            onInsert={(choice) => {
              setPicking(false);
              insertLiveNumber(editor, choice);
            }}
          />
        )}
      </div>
    </NotebookEditorContext.Provider>
  );
}
