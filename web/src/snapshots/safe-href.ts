/** Schemes a snapshot keeps as links; the editor's Link extension allows the same three. */
const ALLOWED = new Set(['http:', 'https:', 'mailto:']);

/**
 * The address of a link if it is absolute http(s) or mailto, else null.
 * Parsing with the WHATWG URL parser first means "java\tscript:" or
 * " javascript:" are read as the browser would read them (URL Standard:
 * tabs and newlines are removed, leading C0 controls and spaces stripped).
 */
export function safeHref(href: unknown): string | null {
  if (typeof href !== 'string' || href.trim() === '') return null;
  let url: URL;
  try {
    url = new URL(href);
  } catch {
    return null;
  }
  return ALLOWED.has(url.protocol) ? url.href : null;
}
