import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/sqlite';
import { Injectable, InternalServerErrorException, NotFoundException } from '@nestjs/common';
import { EventEmitter2 } from '@nestjs/event-emitter';
import {
  canonicalJSON,
  EDITOR_SCHEMA_VERSION,
  ENGINE_VERSION,
  type PublishSnapshotRequest,
  type SnapshotComparison,
  type SnapshotSummary,
  type SnapshotView,
} from '@upwell/common';
import { createHash } from 'node:crypto';
import { Notebook } from '../notebooks/notebook.entity';
import { NotebookPolicy } from '../notebooks/notebook.policy';
import { User } from '../users/user.entity';
import { snapshotFileName, snapshotHtml } from './html/snapshot-html';
import { compareFigures, compareNumbers, diffText, documentText, type ComparedContent } from './snapshot-compare';
import { Snapshot } from './snapshot.entity';
import { SNAPSHOT_PUBLISHED, type SnapshotPublishedEvent } from './snapshot-events';
import { SnapshotFreezer } from './snapshot-freezer';
import { SnapshotPolicy } from './snapshot.policy';
import { presentSnapshotSummary, snapshotJson } from './snapshot.presenter';

/** How often publishing retries when another publish of the same notebook took the number first. */
const NUMBER_ATTEMPTS = 3;

const sha256 = (text: string) => createHash('sha256').update(text, 'utf8').digest('hex');

/** Publishing read-only snapshots of notebooks, reading them back unchanged, and comparing them. */
@Injectable()
export class SnapshotsService {
  constructor(
    private readonly em: EntityManager,
    private readonly notebooks: NotebookPolicy,
    private readonly policy: SnapshotPolicy,
    private readonly freezer: SnapshotFreezer,
    private readonly events: EventEmitter2,
  ) {}

  /**
   * Freezes the notebook as it stands (document, figures, numbers) and stores it in one
   * transaction under the next number; answers the snapshot exactly as GET will.
   */
  async publish(user: User, notebookId: string, body: Required<PublishSnapshotRequest>): Promise<string> {
    const { notebook } = await this.notebooks.authorize(user, notebookId, 'publish');
    await this.em.populate(notebook, ['group']);
    const content = await this.freezer.freeze(user, notebookId, notebook.group.id);
    const payload = canonicalJSON({ notebookTitle: notebook.title, groupId: notebook.group.id, groupName: notebook.group.name, ...content });
    const contentSha256 = sha256(payload);
    let id: string | null = null;
    for (let attempt = 1; !id; attempt++) {
      try {
        id = await this.em.fork().transactional(async (tx) => {
          const last = await tx.findOne(Snapshot, { notebook: notebookId }, { orderBy: { number: 'desc' }, fields: ['number'] });
          const snapshot = tx.create(Snapshot, {
            notebook: tx.getReference(Notebook, notebookId),
            number: (last?.number ?? 0) + 1,
            title: body.title,
            releaseNote: body.releaseNote,
            publishedBy: tx.getReference(User, user.id),
            engineVersion: ENGINE_VERSION,
            editorSchemaVersion: EDITOR_SCHEMA_VERSION,
            figureCount: content.figures.length,
            numberCount: content.numbers.length,
            payload,
            contentSha256,
          });
          await tx.flush();
          await this.verifyStored(tx, snapshot.id, contentSha256);
          return snapshot.id;
        });
      } catch (err) {
        if (!(err instanceof UniqueConstraintViolationException) || attempt >= NUMBER_ATTEMPTS) throw err;
      }
    }
    const stored = await this.load(id, this.em.fork());
    const event: SnapshotPublishedEvent = { snapshotId: stored.id, notebookId, number: stored.number, title: stored.title, publishedById: user.id };
    this.events.emit(SNAPSHOT_PUBLISHED, event);
    return snapshotJson(stored);
  }

  /**
   * Reads the stored payload back inside the publishing transaction and checks its hash, so a
   * snapshot whose bytes did not land as computed is never committed.
   */
  async verifyStored(tx: EntityManager, snapshotId: string, contentSha256: string): Promise<void> {
    // Inside the transaction's own connection (SQLite has one writer; another connection would wait on it).
    const rows = await tx.getConnection().execute<{ payload: string }[]>('select payload from notebook_snapshots where id = ?', [snapshotId], 'all', tx.getTransactionContext());
    if (rows.length !== 1 || sha256(rows[0].payload) !== contentSha256) {
      throw new InternalServerErrorException('the snapshot was not stored intact; nothing was published');
    }
  }

  /** The notebook's snapshots, newest first. */
  async list(user: User, notebookId: string): Promise<{ snapshots: SnapshotSummary[] }> {
    await this.notebooks.authorize(user, notebookId, 'read');
    const all = await this.em.find(Snapshot, { notebook: notebookId }, { populate: ['publishedBy'], orderBy: { number: 'desc' } });
    return { snapshots: all.map(presentSnapshotSummary) };
  }

  /** The snapshot's JSON, byte for byte as published. */
  async json(user: User, snapshotId: string): Promise<string> {
    const { snapshot } = await this.policy.authorize(user, snapshotId, 'read');
    return snapshotJson(await this.withPayload(snapshot));
  }

  /** The self-contained HTML file of a snapshot, with its file name. */
  async html(user: User, snapshotId: string): Promise<{ html: string; fileName: string }> {
    const { snapshot } = await this.policy.authorize(user, snapshotId, 'read');
    return this.htmlOf(snapshot);
  }

  /** The HTML file of a snapshot the caller may already read (signed in, or through a share link). */
  async htmlOf(snapshot: Snapshot): Promise<{ html: string; fileName: string }> {
    const view = this.view(await this.withPayload(snapshot));
    return { html: await snapshotHtml(view), fileName: snapshotFileName(view.notebookTitle, view.number) };
  }

  /** Compares a snapshot with another snapshot of the same notebook, or with the live notebook computed now. */
  async compare(user: User, snapshotId: string, other: 'live' | string): Promise<SnapshotComparison> {
    const { snapshot, access } = await this.policy.authorize(user, snapshotId, 'read');
    const from = this.view(await this.withPayload(snapshot));
    let to: SnapshotComparison['to'];
    let after: ComparedContent;
    if (other === 'live') {
      await this.em.populate(access.notebook, ['group']);
      after = await this.freezer.freeze(user, access.notebook.id, access.notebook.group.id);
      to = { kind: 'live', at: new Date().toISOString() };
    } else {
      const found = await this.em.findOne(Snapshot, { id: other, notebook: snapshot.notebook.id }, { populate: ['publishedBy', 'payload'] });
      if (!found) throw new NotFoundException('with: this notebook has no such snapshot');
      const view = this.view(found);
      after = view;
      to = { kind: 'snapshot', id: view.id, number: view.number, title: view.title, publishedAt: view.publishedAt };
    }
    const before = from as unknown as ComparedContent;
    return {
      from: { kind: 'snapshot', id: from.id, number: from.number, title: from.title, publishedAt: from.publishedAt },
      to,
      text: diffText(documentText(before), documentText(after)),
      figures: compareFigures(before.figures, after.figures),
      numbers: compareNumbers(before.numbers, after.numbers),
    };
  }

  /** The snapshot's JSON as the share route sends it (the same bytes as GET /snapshots/:id). */
  async jsonOf(snapshot: Snapshot): Promise<string> {
    return snapshotJson(await this.withPayload(snapshot));
  }

  private async load(id: string, em: EntityManager): Promise<Snapshot> {
    return em.findOneOrFail(Snapshot, { id }, { populate: ['publishedBy', 'payload'] });
  }

  private async withPayload(snapshot: Snapshot): Promise<Snapshot> {
    await this.em.populate(snapshot, ['payload', 'publishedBy']);
    return snapshot;
  }

  private view(snapshot: Snapshot): SnapshotView {
    return JSON.parse(snapshotJson(snapshot)) as SnapshotView;
  }
}
