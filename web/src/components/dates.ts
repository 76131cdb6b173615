const format = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });

/** A timestamp as people read it in a table: "1 Dec 2026, 18:40". */
export function formatWhen(iso: string): string {
  return format.format(new Date(iso));
}
