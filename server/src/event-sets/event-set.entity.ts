import { Entity, ManyToOne, OptionalProps, PrimaryKey, Property } from '@mikro-orm/core';
import { randomUUID } from 'node:crypto';
import { Notebook } from '../notebooks/notebook.entity';
import { User } from '../users/user.entity';

/** One event of a saved set. */
export interface StoredEvent {
  phase: 'warm' | 'cold';
  start: string;
  peak: string;
  end: string;
  label: string;
}

/**
 * A notebook's saved set of warm and cold events: detected from an index by
 * the engine's rule, then edited by the authors (events added, removed, peak
 * moved, relabelled). Composites, shading and event tables can use it.
 */
@Entity({ tableName: 'event_sets' })
export class EventSet {
  [OptionalProps]?: 'createdAt' | 'updatedAt' | 'derivedFrom';

  @PrimaryKey({ type: 'string', length: 36 })
  id: string = randomUUID();

  @ManyToOne(() => Notebook, { deleteRule: 'cascade' })
  notebook!: Notebook;

  @Property({ type: 'string', length: 120 })
  name!: string;

  /** The index binding and rule the set was first detected with, if any. */
  @Property({ type: 'json', nullable: true })
  derivedFrom: Record<string, unknown> | null = null;

  @Property({ type: 'json' })
  events!: StoredEvent[];

  @ManyToOne(() => User)
  createdBy!: User;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime' })
  updatedAt: Date = new Date();
}
