import { z } from 'zod';

/** C0 controls U+0000–U+001F and DEL U+007F (Unicode 15, ch. 23.1 "Control Codes"). */
const ANY_CONTROL = /[\u0000-\u001f\u007f]/;
/** The same, less tab (U+0009), line feed (U+000A) and carriage return (U+000D), which multi-line text keeps. */
const CONTROL_BUT_LINE_BREAKS = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/;

/** Options of {@link plainText}. */
export interface TextOptions {
  /** Field name for the error message (defaults to "text"). */
  what?: string;
  /** Whether tabs and line breaks are allowed (comments, notes, descriptions). */
  multiline?: boolean;
  /** Message when the value is missing or not a string. */
  error?: string;
}

/**
 * The one rule for every text a request carries: a string without control
 * characters (NUL, escape, backspace, DEL…), which no person types and which
 * databases, logs and terminals handle badly. Single-line text refuses tabs and
 * line breaks too, except around it where `.trim()` removes them. Chain the
 * field's own checks after it: `plainText({ what: 'title' }).trim().min(1).max(200)`.
 */
export function plainText(opts: TextOptions = {}) {
  const what = opts.what ?? 'text';
  const bad = opts.multiline ? CONTROL_BUT_LINE_BREAKS : ANY_CONTROL;
  const allowed = opts.multiline ? ' (tabs and line breaks are fine)' : '';
  return z
    .string(opts.error ? { error: opts.error } : undefined)
    .refine((s) => !bad.test(opts.multiline ? s : s.trim()), {
      message: `${what} must not contain control characters such as NUL (U+0000) or escape${allowed}`,
      abort: true,
    });
}
