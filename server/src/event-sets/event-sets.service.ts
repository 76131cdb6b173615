import { EntityManager } from '@mikro-orm/sqlite';
import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import { methodsSentence, type DetectedEvents, type EventSetView, type detectEventSetRequestSchema, type saveEventSetRequestSchema } from '@upwell/common';
import type { z } from 'zod';
import { FigureInputsService } from '../figures/figure-inputs.service';
import { eventsByRule } from '../figures/figure-events';
import { runEngine } from '../figures/figures.service';
import { NotebookPolicy } from '../notebooks/notebook.policy';
import type { User } from '../users/user.entity';
import { eventOrderProblem } from './event-order';
import { EventSet } from './event-set.entity';
import { presentEventSet } from './event-sets.presenter';

/** Parsed body of POST/PUT event sets. */
export type SaveEventSetBody = z.output<typeof saveEventSetRequestSchema>;
/** Parsed body of the detect route. */
export type DetectEventSetBody = z.output<typeof detectEventSetRequestSchema>;

/** A notebook's saved event sets, and detection of events to start one from. */
@Injectable()
export class EventSetsService {
  constructor(
    private readonly em: EntityManager,
    private readonly policy: NotebookPolicy,
    private readonly inputs: FigureInputsService,
  ) {}

  async list(user: User, notebookId: string): Promise<EventSetView[]> {
    await this.policy.authorize(user, notebookId, 'read');
    const sets = await this.em.find(EventSet, { notebook: notebookId }, { orderBy: { createdAt: 'asc', id: 'asc' } });
    return sets.map(presentEventSet);
  }

  /** Co-authors and the lead author save sets; the events must be sorted and must not overlap. */
  async create(user: User, notebookId: string, body: SaveEventSetBody): Promise<EventSetView> {
    const { notebook } = await this.policy.authorize(user, notebookId, 'edit');
    await this.check(notebook.group.id, body);
    const set = this.em.create(EventSet, { notebook, name: body.name, derivedFrom: body.derivedFrom ?? null, events: body.events, createdBy: user });
    await this.em.flush();
    return presentEventSet(set);
  }

  async update(user: User, notebookId: string, eventSetId: string, body: SaveEventSetBody): Promise<EventSetView> {
    const { notebook } = await this.policy.authorize(user, notebookId, 'edit');
    const set = await this.find(notebookId, eventSetId);
    await this.check(notebook.group.id, body);
    // A new updatedAt changes the cache key of every figure that uses the set.
    Object.assign(set, { name: body.name, derivedFrom: body.derivedFrom ?? null, events: body.events, updatedAt: new Date() });
    await this.em.flush();
    return presentEventSet(set);
  }

  async remove(user: User, notebookId: string, eventSetId: string): Promise<void> {
    await this.policy.authorize(user, notebookId, 'edit');
    const set = await this.find(notebookId, eventSetId);
    await this.em.remove(set).flush();
  }

  /** Events by the rule on an index of the notebook's group, not saved, for the authors to edit. */
  async detect(user: User, notebookId: string, body: DetectEventSetBody): Promise<DetectedEvents> {
    const { notebook } = await this.policy.authorize(user, notebookId, 'read');
    const resolved = await this.inputs.resolve(notebook.group.id, [{ path: 'index', ...body.index }]);
    const index = (await this.inputs.load(resolved)).get('index')!;
    const found = runEngine(() => eventsByRule(index, body.anomaly, body.rule));
    const { start: _s, values: _v, ...used } = index;
    return { index: used, events: found.events, methods: methodsSentence([found.clause], [index]), warnings: found.warnings };
  }

  private async find(notebookId: string, eventSetId: string): Promise<EventSet> {
    const set = await this.em.findOne(EventSet, { id: eventSetId, notebook: notebookId });
    if (!set) throw new NotFoundException(`there is no event set ${eventSetId} in this notebook`);
    return set;
  }

  /** Order and overlap of the events, and the provenance index within the group. */
  private async check(groupId: string, body: SaveEventSetBody): Promise<void> {
    const problem = eventOrderProblem(body.events);
    if (problem) throw new BadRequestException(problem);
    if (body.derivedFrom) {
      await this.inputs.resolve(groupId, [{ path: 'derivedFrom.index', ...body.derivedFrom.index }]);
    }
  }
}
