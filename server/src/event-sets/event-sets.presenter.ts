import type { EventSetView } from '@upwell/common';
import type { EventSet } from './event-set.entity';

/** An event set as the API shows it. */
export function presentEventSet(set: EventSet): EventSetView {
  return {
    id: set.id,
    notebookId: set.notebook.id,
    name: set.name,
    derivedFrom: set.derivedFrom,
    events: set.events.map((e) => ({ phase: e.phase, start: e.start, peak: e.peak, end: e.end, label: e.label })),
    updatedAt: set.updatedAt.toISOString(),
  };
}
