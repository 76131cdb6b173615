/** An event as the order check needs it. */
interface Span {
  phase: string;
  start: string;
  end: string;
  label?: string;
}

/** "event 2 (warm 1997-05 to 1998-04, “1997–98”)" — how a message names an event of a set. */
function name(e: Span, i: number): string {
  return `event ${i + 1} (${e.phase} ${e.start} to ${e.end}${e.label ? `, “${e.label}”` : ''})`;
}

/**
 * Why a set's events are not a usable sequence, or null when they are: events must be sorted by
 * start and must not overlap (a month in two events would be counted twice by tables and
 * composites). Months "YYYY-MM" compare correctly as text.
 */
export function eventOrderProblem(events: readonly Span[]): string | null {
  for (let i = 1; i < events.length; i++) {
    const a = events[i - 1];
    const b = events[i];
    if (b.start < a.start) return `events must be sorted by start: ${name(b, i)} starts before ${name(a, i - 1)}`;
    if (b.start <= a.end) return `events must not overlap: ${name(a, i - 1)} and ${name(b, i)} share months`;
  }
  return null;
}
