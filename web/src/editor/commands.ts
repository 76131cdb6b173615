import type { Editor } from '@tiptap/core';
import { LIVE_FIGURE, LIVE_NUMBER } from '@upwell/common';

/** Inserts a new live figure at the cursor; its settings open under it. */
export function insertFigure(editor: Editor): boolean {
  return editor
    .chain()
    .focus()
    .insertContent({ type: LIVE_FIGURE, attrs: { id: crypto.randomUUID(), recipe: null, caption: '' } })
    .run();
}

/** What a live number points at, chosen in the picker. */
export interface LiveNumberChoice {
  recipe: Record<string, unknown>;
  key: string;
  precision: number;
  figureId: string | null;
}

/** Inserts a live number at the cursor. */
export function insertLiveNumber(editor: Editor, choice: LiveNumberChoice): boolean {
  return editor.chain().focus().insertContent({ type: LIVE_NUMBER, attrs: choice }).run();
}

/** The typed triggers: "/figure" or "/number" at the end of the text before the cursor, then Enter. */
export const TYPED_TRIGGERS = { figure: '/figure', number: '/number' } as const;

/** Which typed trigger, if any, ends the text before the cursor. */
export function typedTriggerBefore(editor: Editor): { which: keyof typeof TYPED_TRIGGERS; from: number; to: number } | null {
  const { selection } = editor.state;
  if (!selection.empty) return null;
  const { $from } = selection;
  if (!$from.parent.isTextblock) return null;
  const before = $from.parent.textBetween(0, $from.parentOffset, undefined, '\ufffc');
  const m = /(?:^|\s)\/(figure|number)$/.exec(before);
  if (!m) return null;
  const which = m[1] as keyof typeof TYPED_TRIGGERS;
  return { which, from: $from.pos - TYPED_TRIGGERS[which].length, to: $from.pos };
}

/** "Ctrl+Alt+F", or "⌘⌥F" on a Mac. */
export function shortcutLabel(key: string): string {
  const mac = typeof navigator !== 'undefined' && /Mac|iPhone|iPad/.test(navigator.platform || navigator.userAgent);
  return mac ? `⌘⌥${key.toUpperCase()}` : `Ctrl+Alt+${key.toUpperCase()}`;
}
