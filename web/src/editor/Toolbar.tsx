import { useEditorState, type Editor } from '@tiptap/react';
import { useId, useState, type ReactNode } from 'react';
import { insertFigure, shortcutLabel } from './commands';

function Tool({ label, title, active, disabled, onClick, children }: { label: string; title?: string; active?: boolean; disabled?: boolean; onClick: () => void; children: ReactNode }) {
  return (
    <button
      type="button"
      className="upwell-tool"
      aria-label={label}
      title={title ?? label}
      aria-pressed={active === undefined ? undefined : active}
      disabled={disabled}
      // Keep the editor's selection: the click must not move focus before the command runs.
      onMouseDown={(e) => e.preventDefault()}
      onClick={onClick}
    >
      {children}
    </button>
  );
}

function LinkForm({ editor, onDone }: { editor: Editor; onDone: () => void }) {
  const id = useId();
  const [href, setHref] = useState<string>(() => editor.getAttributes('link').href ?? 'https://');
  return (
    <form
      className="upwell-link-form"
      aria-label="Link"
      onSubmit={(e) => {
        e.preventDefault();
        const url = href.trim();
        if (url && url !== 'https://') editor.chain().focus().extendMarkRange('link').setLink({ href: url }).run();
        onDone();
      }}
    >
      <label htmlFor={id}>Link address</label>
      <input id={id} type="url" value={href} autoFocus onChange={(e) => setHref(e.target.value)} onKeyDown={(e) => e.key === 'Escape' && onDone()} />
      <button type="submit" className="upwell-tool">
        Apply link
      </button>
      <button
        type="button"
        className="upwell-tool"
        onClick={() => {
          editor.chain().focus().extendMarkRange('link').unsetLink().run();
          onDone();
        }}
      >
        Remove link
      </button>
    </form>
  );
}

/** The editor's quiet toolbar: text styles, structure, and the two live insertions. */
export function Toolbar({ editor, onInsertNumber }: { editor: Editor; onInsertNumber: () => void }) {
  const [linking, setLinking] = useState(false);
  const s = useEditorState({
    editor,
    selector: ({ editor: e }) => ({
      bold: e.isActive('bold'),
      italic: e.isActive('italic'),
      h2: e.isActive('heading', { level: 2 }),
      h3: e.isActive('heading', { level: 3 }),
      bullet: e.isActive('bulletList'),
      ordered: e.isActive('orderedList'),
      quote: e.isActive('blockquote'),
      link: e.isActive('link'),
      table: e.isActive('table'),
      canUndo: e.can().undo(),
      canRedo: e.can().redo(),
    }),
  });
  const c = () => editor.chain().focus();
  return (
    <div className="upwell-toolbar-wrap">
      <div role="toolbar" aria-label="Writing tools" className="upwell-toolbar">
        <Tool label="Bold" title="Bold (Ctrl+B)" active={s.bold} onClick={() => c().toggleBold().run()}>
          <b>B</b>
        </Tool>
        <Tool label="Italic" title="Italic (Ctrl+I)" active={s.italic} onClick={() => c().toggleItalic().run()}>
          <i>I</i>
        </Tool>
        <span className="upwell-tool-sep" aria-hidden />
        <Tool label="Section heading" active={s.h2} onClick={() => c().toggleHeading({ level: 2 }).run()}>
          H2
        </Tool>
        <Tool label="Subsection heading" active={s.h3} onClick={() => c().toggleHeading({ level: 3 }).run()}>
          H3
        </Tool>
        <Tool label="Bulleted list" active={s.bullet} onClick={() => c().toggleBulletList().run()}>
          • List
        </Tool>
        <Tool label="Numbered list" active={s.ordered} onClick={() => c().toggleOrderedList().run()}>
          1. List
        </Tool>
        <Tool label="Quotation" active={s.quote} onClick={() => c().toggleBlockquote().run()}>
          “ ”
        </Tool>
        <Tool label="Link" active={s.link || linking} onClick={() => setLinking((l) => !l)}>
          Link
        </Tool>
        <Tool label="Insert table" onClick={() => c().insertTable({ rows: 3, cols: 3, withHeaderRow: true }).run()}>
          Table
        </Tool>
        {s.table && (
          <>
            <Tool label="Add table row" onClick={() => c().addRowAfter().run()}>
              + Row
            </Tool>
            <Tool label="Add table column" onClick={() => c().addColumnAfter().run()}>
              + Column
            </Tool>
            <Tool label="Delete table" onClick={() => c().deleteTable().run()}>
              − Table
            </Tool>
          </>
        )}
        <span className="upwell-tool-sep" aria-hidden />
        <Tool label="Insert figure" title={`Insert a live figure (${shortcutLabel('f')}, or type /figure then Enter)`} onClick={() => insertFigure(editor)}>
          Figure
        </Tool>
        <Tool label="Insert live number" title={`Insert a live number (${shortcutLabel('n')}, or type /number then Enter)`} onClick={onInsertNumber}>
          Number
        </Tool>
        <span className="upwell-tool-sep" aria-hidden />
        <Tool label="Undo" title="Undo your last change (Ctrl+Z)" disabled={!s.canUndo} onClick={() => c().undo().run()}>
          ↶
        </Tool>
        <Tool label="Redo" title="Redo (Ctrl+Shift+Z)" disabled={!s.canRedo} onClick={() => c().redo().run()}>
          ↷
        </Tool>
      </div>
      {linking && <LinkForm editor={editor} onDone={() => setLinking(false)} />}
    </div>
  );
}
