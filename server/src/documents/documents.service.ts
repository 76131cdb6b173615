import { raw } from '@mikro-orm/core';
import { EntityManager } from '@mikro-orm/sqlite';
import { BadRequestException, Injectable, Logger } from '@nestjs/common';
import type { DocumentState, DocumentUpdateResponse, PmJson } from '@upwell/common';
import * as Y from 'yjs';
import { Notebook } from '../notebooks/notebook.entity';
import { NotebookPolicy } from '../notebooks/notebook.policy';
import type { User } from '../users/user.entity';
import { renderDocument } from './document-render';
import { initialDocumentState } from './initial-document';
import { newLiveNodeIssues } from './live-node-check';
import { NotebookDocument, NotebookUpdate } from './notebook-document.entity';

/** Updates waiting in the log before they are folded into the stored state. */
const COMPACT_AFTER = 50;

/**
 * Stores notebook documents as Yjs state plus an append-only log of accepted
 * updates. An update is written before it is acknowledged; compaction merges
 * the log into the state in one transaction (Yjs merging is order-independent,
 * so a crash leaves either the log or the merged state, never neither).
 */
@Injectable()
export class DocumentsService {
  private readonly logger = new Logger('Documents');
  private liveWriter: ((notebookId: string, update: Uint8Array, authorId: string) => Promise<boolean>) | null = null;

  constructor(
    private readonly em: EntityManager,
    private readonly policy: NotebookPolicy,
  ) {}

  /** Creates the first state of a new notebook's document, inside the caller's unit of work. */
  createInitial(em: EntityManager, notebook: Notebook, title: string, description: string): NotebookDocument {
    return em.create(NotebookDocument, { notebook, state: Buffer.from(initialDocumentState(title, description)) });
  }

  /** Copies a document's current content for a duplicated notebook. */
  async copyInto(em: EntityManager, from: string, to: Notebook): Promise<void> {
    const state = Y.encodeStateAsUpdate(await this.load(from, em));
    em.create(NotebookDocument, { notebook: to, state: Buffer.from(state) });
  }

  async state(user: User, notebookId: string): Promise<DocumentState> {
    await this.policy.authorize(user, notebookId, 'read');
    const stored = await this.em.findOneOrFail(NotebookDocument, { notebook: notebookId });
    const doc = await this.load(notebookId);
    return { notebookId, state: Buffer.from(Y.encodeStateAsUpdate(doc)).toString('base64'), updatedAt: stored.updatedAt.toISOString() };
  }

  /**
   * Lets the co-editing rooms take HTTP edits of a document that is open, so
   * people editing it live receive them; the writer answers false when no
   * room has the document open.
   */
  useLiveWriter(writer: (notebookId: string, update: Uint8Array, authorId: string) => Promise<boolean>): void {
    this.liveWriter = writer;
  }

  /** Accepts one update from a person who may edit; refuses one that breaks the document schema. */
  async applyFromHttp(user: User, notebookId: string, base64: string): Promise<DocumentUpdateResponse> {
    await this.policy.authorize(user, notebookId, 'edit');
    const update = Buffer.from(base64, 'base64');
    await this.checkLiveNodes(notebookId, update);
    if (this.liveWriter && (await this.liveWriter(notebookId, update, user.id))) return { stored: true, updatedAt: new Date().toISOString() };
    const saved = await this.append(notebookId, update, user.id);
    return { stored: true, updatedAt: saved.toISOString() };
  }

  /**
   * Refuses an HTTP update that brings in a recipe the engine cannot compute or a caption over
   * the limit (live-node-check.ts). Socket edits skip this (they are small and frequent; the
   * editor writes recipes only through the schema-validated form); a figure with unreadable
   * settings says so where it is shown.
   */
  private async checkLiveNodes(notebookId: string, update: Uint8Array): Promise<void> {
    const doc = await this.load(notebookId);
    const before = renderDocument(doc).json as unknown as PmJson;
    let after: PmJson;
    try {
      Y.applyUpdate(doc, update);
      after = renderDocument(doc).json as unknown as PmJson;
    } catch (err) {
      throw new BadRequestException(`the document update was refused: ${err instanceof Error ? err.message : 'it could not be read'}`);
    }
    const issues = newLiveNodeIssues(before, after);
    if (issues.length) {
      throw new BadRequestException({
        message: `the document update was refused: ${issues.map((i) => `${i.path}: ${i.message}`).join('; ')}`,
        issues: issues.map((i) => ({ path: i.path, message: i.message })),
      });
    }
  }

  /**
   * Checks an update against the current document and stores it. Used by HTTP
   * and by the socket gateway alike; the caller has already checked access.
   * A caller holding the open room passes its document as `current`.
   */
  async append(notebookId: string, update: Uint8Array, authorId: string | null, em: EntityManager = this.em, current?: Y.Doc): Promise<Date> {
    // `current`: the open room's document, which holds exactly what is stored; copying it spares reading the state and log.
    const doc = current ? copyOf(current) : await this.load(notebookId, em);
    const pendingBefore = pendingOf(doc);
    try {
      Y.applyUpdate(doc, update);
      renderDocument(doc);
    } catch (err) {
      throw new BadRequestException(`the document update was refused: ${err instanceof Error ? err.message : 'it could not be read'}`);
    }
    // Yjs keeps an update whose dependencies it lacks as pending, invisible; storing and acking it would be a lie.
    const pendingAfter = pendingOf(doc);
    if (pendingAfter !== null && pendingAfter !== pendingBefore) throw new MissingDependencies();
    const now = new Date();
    em.create(NotebookUpdate, { notebook: notebookId, update: Buffer.from(update), author: authorId });
    await em.nativeUpdate(NotebookDocument, { notebook: notebookId }, { updatedAt: now });
    await em.nativeUpdate(Notebook, { id: notebookId }, { updatedAt: now });
    await em.flush();
    if ((await em.count(NotebookUpdate, { notebook: notebookId })) >= COMPACT_AFTER) {
      await this.compact(notebookId, em.fork()).catch((err) => this.logger.error(`compaction of ${notebookId} failed: ${err}`));
    }
    return now;
  }

  /** The document as it stands: stored state with the waiting updates applied. */
  async load(notebookId: string, em: EntityManager = this.em): Promise<Y.Doc> {
    const stored = await em.findOneOrFail(NotebookDocument, { notebook: notebookId }, { refresh: true });
    const updates = await em.find(NotebookUpdate, { notebook: notebookId, id: { $gt: stored.compactedThrough } }, { orderBy: { id: 'asc' } });
    const doc = new Y.Doc({ gc: true });
    Y.applyUpdate(doc, stored.state);
    for (const u of updates) Y.applyUpdate(doc, u.update);
    return doc;
  }

  /** Folds the update log into the stored state and refreshes the JSON and text renderings. */
  async compact(notebookId: string, em: EntityManager): Promise<void> {
    await em.transactional(async (tx) => {
      // A write first takes SQLite's write lock (waiting out the busy timeout) before
      // anything is read, so the log read below is the latest even when another
      // process shares the file; read first, a deferred transaction would fail to
      // upgrade once that process had appended. Only rows read here are deleted.
      await tx.nativeUpdate(NotebookDocument, { notebook: notebookId }, { compactedThrough: raw('compacted_through') });
      const stored = await tx.findOneOrFail(NotebookDocument, { notebook: notebookId }, { refresh: true });
      const updates = await tx.find(NotebookUpdate, { notebook: notebookId, id: { $gt: stored.compactedThrough } }, { orderBy: { id: 'asc' } });
      if (!updates.length) return;
      const merged = Y.mergeUpdates([stored.state, ...updates.map((u) => u.update)]);
      const doc = new Y.Doc();
      Y.applyUpdate(doc, merged);
      const { json, text } = renderDocument(doc);
      stored.state = Buffer.from(Y.encodeStateAsUpdate(doc));
      stored.compactedThrough = updates[updates.length - 1].id;
      stored.json = json;
      stored.text = text;
      await tx.nativeDelete(NotebookUpdate, { notebook: notebookId, id: { $lte: stored.compactedThrough } });
    });
  }
}

/**
 * Refusal of an update that builds on changes the server never received
 * (Yjs would keep it pending: stored, acknowledged, never visible). The
 * sender should resync (y-protocols sync step 1/2), which sends what is missing.
 */
export class MissingDependencies extends BadRequestException {
  constructor() {
    super('the document update builds on changes the server never received, so it was not applied; resync (sync step 1/2) to send them');
  }
}

/** What Yjs holds back as pending in a document (structs and deletions waiting for missing dependencies), or null. */
function pendingOf(doc: Y.Doc): string | null {
  const { pendingStructs, pendingDs } = doc.store;
  if (!pendingStructs && !pendingDs) return null;
  return `${pendingStructs ? Buffer.from(pendingStructs.update).toString('base64') : ''}|${pendingDs ? Buffer.from(pendingDs).toString('base64') : ''}`;
}

/** An independent copy of a document, so checking an update against it leaves the original untouched. */
function copyOf(doc: Y.Doc): Y.Doc {
  const copy = new Y.Doc({ gc: true });
  Y.applyUpdate(copy, Y.encodeStateAsUpdate(doc));
  return copy;
}
