import { TextArea } from '@radix-ui/themes';
import { useId, useRef, useState, type KeyboardEvent } from 'react';
import { COMMENT_LIMITS } from '@upwell/common';
import { insertMention, matchMembers, mentionQueryAt, type Mentionable } from './mentions';

/** Props of MentionTextArea. */
export interface MentionTextAreaProps {
  /** Accessible name of the box ("Comment", "Reply to note 2"). */
  label: string;
  value: string;
  onChange: (value: string) => void;
  /** People offered after an `@`. */
  members: readonly Mentionable[];
  /** Ctrl/Cmd+Enter sends, as Enter alone starts a new line in a note. */
  onSubmit?: () => void;
  placeholder?: string;
  disabled?: boolean;
}

/**
 * A plain-text box that offers the group's members after an `@`: arrow keys
 * move through them, Enter or Tab puts the full name in, Escape closes the list.
 */
export function MentionTextArea({ label, value, onChange, members, onSubmit, placeholder, disabled }: MentionTextAreaProps) {
  const ref = useRef<HTMLTextAreaElement>(null);
  const listId = useId();
  const [caret, setCaret] = useState(0);
  const [active, setActive] = useState(0);
  const [dismissed, setDismissed] = useState<number | null>(null);
  const at = mentionQueryAt(value, caret);
  const options = at && dismissed !== at.start ? matchMembers(members, at.query) : [];
  const open = options.length > 0;
  const current = Math.min(active, options.length - 1);

  const choose = (m: Mentionable) => {
    if (!at) return;
    const next = insertMention(value, at, m);
    onChange(next.text);
    setCaret(next.caret);
    setActive(0);
    requestAnimationFrame(() => ref.current?.setSelectionRange(next.caret, next.caret));
    ref.current?.focus();
  };

  const onKeyDown = (e: KeyboardEvent<HTMLTextAreaElement>) => {
    if (open && (e.key === 'ArrowDown' || e.key === 'ArrowUp')) {
      e.preventDefault();
      setActive((current + (e.key === 'ArrowDown' ? 1 : options.length - 1)) % options.length);
    } else if (open && (e.key === 'Enter' || e.key === 'Tab') && !e.shiftKey) {
      e.preventDefault();
      choose(options[current]!);
    } else if (open && e.key === 'Escape') {
      e.preventDefault();
      setDismissed(at!.start);
    } else if (e.key === 'Enter' && (e.metaKey || e.ctrlKey)) {
      e.preventDefault();
      onSubmit?.();
    }
  };

  return (
    <div className="upwell-mention-box">
      <TextArea
        ref={ref}
        aria-label={label}
        aria-autocomplete="list"
        aria-controls={open ? listId : undefined}
        aria-expanded={open}
        aria-activedescendant={open ? `${listId}-${current}` : undefined}
        value={value}
        placeholder={placeholder}
        disabled={disabled}
        maxLength={COMMENT_LIMITS.bodyMax}
        rows={3}
        onChange={(e) => {
          onChange(e.target.value);
          setCaret(e.target.selectionStart);
        }}
        onSelect={(e) => setCaret(e.currentTarget.selectionStart)}
        onKeyDown={onKeyDown}
      />
      {open && (
        <ul role="listbox" id={listId} aria-label="People to mention" className="upwell-mention-list">
          {options.map((m, i) => (
            <li
              key={m.id}
              id={`${listId}-${i}`}
              role="option"
              aria-selected={i === current}
              onMouseDown={(e) => {
                // Keep focus in the box, so the caret stays where the name goes.
                e.preventDefault();
                choose(m);
              }}
            >
              {m.name}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
