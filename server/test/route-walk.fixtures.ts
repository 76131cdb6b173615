import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import * as Y from 'yjs';
import { DOCUMENT_FIELD, type GroupAction, type NotebookAction } from '@upwell/common';
import { buildGroup, buildNotebook, type TestUser } from './factories';
import { fixture } from './fixtures/netcdf/fixture-path';
import { invitationToken, mailTo } from './mail-inbox';

/**
 * The one place the route walk (route-walk.e2e.spec.ts) learns about routes.
 * A new route in the OpenAPI document needs an entry in ROUTE_RULES, and a new
 * path parameter name an entry in PARAM_FIXTURES; the walk fails naming the
 * route until it has them.
 */

/** People of the walk: all but `outsider` are in group A; `lead` is its admin and the notebook's lead author. */
export interface People {
  lead: TestUser;
  coauthor: TestUser;
  reviewer: TestUser;
  reader: TestUser;
  member: TestUser; // in group A, no notebook role
  spare: TestUser; // in group A, reader on the notebook; the person role/member routes act upon
  outsider: TestUser; // only in group B
}
export type Actor = keyof People;
export const ACTORS: Actor[] = ['lead', 'coauthor', 'reviewer', 'reader', 'member', 'spare', 'outsider'];
/** Notebook role of each actor in a world; null = none. */
export const NOTEBOOK_ROLE_OF: Record<Actor, 'lead-author' | 'co-author' | 'reviewer' | 'reader' | null> = {
  lead: 'lead-author', coauthor: 'co-author', reviewer: 'reviewer', reader: 'reader', member: null, spare: 'reader', outsider: null,
};

/** Everything in group A one walk step may touch; built fresh for each step that may change it. */
export interface World {
  groupId: string;
  notebookId: string;
  seriesId: string;
  stagedUploadId: string;
  fieldId: string;
  zonalFieldId: string;
  eventSetId: string;
  checkpointId: string;
  threadId: string;
  replyId: string;
  /** A notification of `reader` (mentioned in the reply). */
  notificationId: string;
  /** A Yjs update a co-author could send to the notebook's document, base64. */
  documentUpdate: string;
  /** Snapshot v1 of the notebook, an active share link of it and its token. */
  snapshotId: string;
  linkId: string;
  shareToken: string;
  /** The notebook as an upwell-notebook file, a valid import body. */
  notebookFile: Record<string, unknown>;
  /** A pending invitation to group A and one to the notebook, the group one's token, and the mail that carried it. */
  groupInvitationId: string;
  notebookInvitationId: string;
  invitationToken: string;
  messageId: string;
  /** A region set (one polygon over the globe) and an upload of native-grid budget terms (grids_tiny_budget.nc). */
  regionSetId: string;
  budgetUploadId: string;
}

/** Path parameter name → the id of group A's thing it names. */
export const PARAM_FIXTURES: Record<string, (w: World, path: string, p: People) => string> = {
  groupId: (w) => w.groupId,
  notebookId: (w) => w.notebookId,
  userId: (_w, _path, p) => p.spare.user.id,
  seriesId: (w) => w.seriesId,
  version: () => '1',
  uploadId: (w) => w.stagedUploadId,
  fieldId: (w, path) => (path.startsWith('/api/zonal-fields/') ? w.zonalFieldId : w.fieldId),
  eventSetId: (w) => w.eventSetId,
  checkpointId: (w) => w.checkpointId,
  threadId: (w) => w.threadId,
  replyId: (w) => w.replyId,
  notificationId: (w) => w.notificationId,
  snapshotId: (w) => w.snapshotId,
  linkId: (w) => w.linkId,
  // Share tokens and invitation tokens are both credentials in the path.
  token: (w, path) => (path.startsWith('/api/invitations/') ? w.invitationToken : w.shareToken),
  invitationId: (w, path) => (path.startsWith('/api/groups/') ? w.groupInvitationId : w.notebookInvitationId),
  messageId: (w) => w.messageId,
  regionSetId: (w) => w.regionSetId,
};

/**
 * Who a route answers, as the product's roles describe it:
 * - public: anyone, no token;
 * - self: any signed-in person, about themselves (outsiders included);
 * - notebook: the roles table (notebookRoleAllows) for `action`; no role in the group → 404;
 * - group: the group roles table (groupRoleAllows) for `action`; outside the group → 404;
 * - custom: `expect` says it per actor (owner-only things).
 */
export type RouteRule = {
  /** A body that passes validation, so role checks are reached; also the base of the malformed bodies. */
  body?: (w: World, p: People) => Record<string, unknown>;
  multipart?: boolean;
  /** Fields holding lags and windows: negative or huge values must be refused (400). */
  lagFields?: string[];
  /** Query string the route needs to be answerable at all. */
  query?: Record<string, string>;
  /** A public route that is open but may answer this status instead of 2xx (e.g. the demo list with the seed off). */
  openStatus?: number;
  /** The path parameter is itself the credential (a share token): whoever holds it is let in, outsiders too. */
  capability?: boolean;
  /** A POST that computes and stores nothing (e.g. a map): actors it lets in share one world instead of each building one. */
  readOnly?: boolean;
} & (
  | { scope: 'public' | 'self' }
  | { scope: 'notebook'; action: NotebookAction }
  | { scope: 'group'; action: GroupAction }
  | { scope: 'custom'; expect: (actor: Actor) => 'ok' | 403 | 404 }
);

const monthly = (n = 48, start = '2000-01') => ({ start, values: Array.from({ length: n }, (_, i) => Math.sin(i / 3) + (i % 12) / 10) });
const series = (w: World) => ({ seriesId: w.seriesId });

/** "METHOD /api/path/{param}" → its rule. */
export const ROUTE_RULES: Record<string, RouteRule> = {
  'GET /api/health': { scope: 'public' },
  'POST /api/auth/register': { scope: 'public', body: () => ({ name: 'Walker', email: `walk.${Math.random().toString(36).slice(2)}@example.org`, password: 'correct horse battery' }) },
  'POST /api/auth/login': { scope: 'public', body: (_w, p) => ({ email: p.lead.user.email, password: p.lead.password }) },
  'POST /api/auth/logout': { scope: 'self' },
  'GET /api/auth/me': { scope: 'self' },
  'PATCH /api/users/me': { scope: 'self', body: () => ({ name: 'Renamed Walker' }) },
  'GET /api/groups': { scope: 'self' },
  'POST /api/groups': { scope: 'self', body: () => ({ name: 'Walk group' }) },
  'GET /api/groups/{groupId}': { scope: 'group', action: 'view' },
  'PATCH /api/groups/{groupId}': { scope: 'group', action: 'rename', body: () => ({ name: 'Renamed group' }) },
  'POST /api/groups/{groupId}/members': { scope: 'group', action: 'manage-members', body: (_w, p) => ({ email: p.outsider.user.email }) },
  'PATCH /api/groups/{groupId}/members/{userId}': { scope: 'group', action: 'manage-members', body: () => ({ role: 'admin' }) },
  'DELETE /api/groups/{groupId}/members/{userId}': { scope: 'group', action: 'manage-members' },
  'GET /api/groups/{groupId}/notebooks': { scope: 'group', action: 'view' },
  'POST /api/groups/{groupId}/notebooks': { scope: 'group', action: 'create-notebook', body: () => ({ title: 'Walk notebook' }) },
  'GET /api/notebooks/{notebookId}': { scope: 'notebook', action: 'read' },
  'PATCH /api/notebooks/{notebookId}': { scope: 'notebook', action: 'rename', body: () => ({ title: 'Renamed notebook' }) },
  'DELETE /api/notebooks/{notebookId}': { scope: 'notebook', action: 'delete' },
  'POST /api/notebooks/{notebookId}/duplicate': { scope: 'notebook', action: 'delete' },
  'GET /api/notebooks/{notebookId}/roles': { scope: 'notebook', action: 'read' },
  'PUT /api/notebooks/{notebookId}/roles/{userId}': { scope: 'notebook', action: 'manage-access', body: () => ({ role: 'reviewer' }) },
  'DELETE /api/notebooks/{notebookId}/roles/{userId}': { scope: 'notebook', action: 'manage-access' },
  'GET /api/groups/{groupId}/series': { scope: 'group', action: 'view' },
  'GET /api/series/{seriesId}': { scope: 'group', action: 'view' },
  'PATCH /api/series/{seriesId}': { scope: 'group', action: 'upload-series', body: () => ({ notes: 'checked' }) },
  'DELETE /api/series/{seriesId}': { scope: 'group', action: 'delete-series' },
  'GET /api/series/{seriesId}/usage': { scope: 'group', action: 'view' },
  'GET /api/series/{seriesId}/versions/{version}/values': { scope: 'group', action: 'view' },
  'GET /api/series/{seriesId}/versions/{version}/csv': { scope: 'group', action: 'view' },
  'POST /api/analysis/anomaly': { scope: 'self', body: () => ({ series: monthly(), base: { from: '2000-01', to: '2002-12' }, smooth: 3, minYears: 2 }) },
  'POST /api/analysis/lag-correlation': { scope: 'self', lagFields: ['maxLag'], body: () => ({ x: monthly(), y: monthly(), maxLag: 6 }) },
  'POST /api/analysis/events': { scope: 'self', lagFields: ['minDuration', 'smooth'], body: () => ({ index: monthly(), threshold: 0.5, minDuration: 3, smooth: 3 }) },
  'POST /api/analysis/composite': {
    scope: 'self', lagFields: ['before', 'after'],
    body: () => ({ series: monthly(), events: [{ at: '2001-01' }, { at: '2002-06' }], before: 3, after: 6 }),
  },
  'POST /api/analysis/trend': { scope: 'self', body: () => ({ series: monthly(), per: 'decade' }) },
  'POST /api/analysis/budget': { scope: 'self', body: () => ({ tendency: monthly(), terms: { advection: monthly() } }) },
  'POST /api/analysis/integrate': { scope: 'self', body: () => ({ series: monthly(), units: 'Pg C/yr', from: '2000-01', to: '2000-12' }) },
  'POST /api/groups/{groupId}/uploads': { scope: 'group', action: 'upload-series', multipart: true },
  'GET /api/groups/{groupId}/uploads': { scope: 'group', action: 'upload-series' },
  'POST /api/uploads/{uploadId}/import': { scope: 'group', action: 'upload-series', body: () => importIndex },
  'DELETE /api/uploads/{uploadId}': { scope: 'group', action: 'upload-series' },
  'GET /api/groups/{groupId}/fields': { scope: 'group', action: 'view' },
  'GET /api/zonal-fields/{fieldId}': { scope: 'group', action: 'view' },
  'POST /api/fields/{fieldId}/reductions': { scope: 'group', action: 'upload-series', body: () => ({ kind: 'zonal-mean', name: 'Zonal mean', lon: [0, 360] }) },
  'POST /api/fields/{fieldId}/maps': { scope: 'group', action: 'view', readOnly: true, body: () => ({ mode: 'mean' }) },
  'POST /api/notebooks/{notebookId}/figures': {
    scope: 'notebook', action: 'read', lagFields: ['recipe.maxLag'],
    body: (w) => ({ recipe: { kind: 'lag-correlation', index: series(w), series: series(w), maxLag: 6 } }),
  },
  'GET /api/notebooks/{notebookId}/event-sets': { scope: 'notebook', action: 'read' },
  'POST /api/notebooks/{notebookId}/event-sets': { scope: 'notebook', action: 'edit', body: () => eventSet },
  'POST /api/notebooks/{notebookId}/event-sets/detect': { scope: 'notebook', action: 'read', body: (w) => ({ index: series(w) }) },
  'PUT /api/notebooks/{notebookId}/event-sets/{eventSetId}': { scope: 'notebook', action: 'edit', body: () => eventSet },
  'DELETE /api/notebooks/{notebookId}/event-sets/{eventSetId}': { scope: 'notebook', action: 'edit' },
  'POST /api/notebooks/{notebookId}/checkpoints': { scope: 'notebook', action: 'edit', body: () => ({ name: 'Walk checkpoint' }) },
  'GET /api/notebooks/{notebookId}/checkpoints': { scope: 'notebook', action: 'read' },
  'POST /api/notebooks/{notebookId}/checkpoints/{checkpointId}/restore': { scope: 'notebook', action: 'edit' },
  'GET /api/notebooks/{notebookId}/comments': { scope: 'notebook', action: 'read' },
  'POST /api/notebooks/{notebookId}/comments': { scope: 'notebook', action: 'comment', body: () => ({ anchor: { type: 'figure', figureId: 'fig-walk' }, body: 'A walk comment' }) },
  'POST /api/notebooks/{notebookId}/comments/{threadId}/replies': { scope: 'notebook', action: 'comment', body: () => ({ body: 'A walk reply' }) },
  'POST /api/notebooks/{notebookId}/comments/{threadId}/resolve': { scope: 'notebook', action: 'comment' },
  'POST /api/notebooks/{notebookId}/comments/{threadId}/reopen': { scope: 'notebook', action: 'comment' },
  // The thread and the reply are the lead author's own: only they (author and lead author at once) may delete them.
  'DELETE /api/notebooks/{notebookId}/comments/{threadId}': { scope: 'custom', expect: (a) => commentOwnerOnly(a) },
  'DELETE /api/notebooks/{notebookId}/comments/{threadId}/replies/{replyId}': { scope: 'custom', expect: (a) => commentOwnerOnly(a) },
  'GET /api/notifications': { scope: 'self' },
  'POST /api/notifications/read-all': { scope: 'self' },
  // Someone else's notification is not there for you.
  'POST /api/notifications/{notificationId}/read': { scope: 'custom', expect: (a) => (a === 'reader' ? 'ok' : 404) },
  'GET /api/notebooks/{notebookId}/document': { scope: 'notebook', action: 'read' },
  'POST /api/notebooks/{notebookId}/document/updates': { scope: 'notebook', action: 'edit', body: (w) => ({ update: w.documentUpdate }) },
  // Snapshots and share links (issue 7): reads follow the notebook's roles, publishing and links are the lead author's.
  'POST /api/notebooks/{notebookId}/snapshots': { scope: 'notebook', action: 'publish', body: () => ({ title: 'Walk snapshot', releaseNote: 'walked' }) },
  'GET /api/notebooks/{notebookId}/snapshots': { scope: 'notebook', action: 'read' },
  'GET /api/snapshots/{snapshotId}': { scope: 'notebook', action: 'read' },
  'GET /api/snapshots/{snapshotId}/html': { scope: 'notebook', action: 'read' },
  'GET /api/snapshots/{snapshotId}/compare': { scope: 'notebook', action: 'read', query: { with: 'live' } },
  'POST /api/snapshots/{snapshotId}/share-links': { scope: 'notebook', action: 'publish', body: () => ({ expiresAt: null }) },
  'GET /api/snapshots/{snapshotId}/share-links': { scope: 'notebook', action: 'publish' },
  'DELETE /api/snapshots/{snapshotId}/share-links/{linkId}': { scope: 'notebook', action: 'publish' },
  'GET /api/shared/{token}': { scope: 'public', capability: true },
  'GET /api/shared/{token}/html': { scope: 'public', capability: true },
  // Notebook files (issue 8): export follows read; importing makes a new notebook, as creating one does.
  'GET /api/notebooks/{notebookId}/export': { scope: 'notebook', action: 'read' },
  'POST /api/groups/{groupId}/notebooks/import': { scope: 'group', action: 'create-notebook', body: (w) => w.notebookFile },
  // The demo accounts: public, and /api/demo answers 404 while the demo seed is off (as in this walk).
  'GET /api/demo/status': { scope: 'public' },
  'GET /api/demo': { scope: 'public', openStatus: 404 },
  // E-mail and invitations (issue 7): admins invite to the group, the lead author to the notebook; the token is the credential.
  'GET /api/mail/status': { scope: 'self' },
  // Region sets and regional budgets on native grids (issue 16): group members read, those who may upload series make.
  'GET /api/groups/{groupId}/region-sets': { scope: 'group', action: 'view' },
  'POST /api/groups/{groupId}/region-sets': { scope: 'group', action: 'upload-series', body: () => ({ name: 'Niño boxes', source: { kind: 'standard-boxes', boxIds: ['nino34'] } }) },
  'GET /api/region-sets/{regionSetId}': { scope: 'group', action: 'view' },
  'POST /api/region-sets/{regionSetId}/versions': { scope: 'group', action: 'upload-series', body: () => ({ source: { kind: 'standard-boxes', boxIds: ['nino3', 'nino4'] } }) },
  'POST /api/groups/{groupId}/regional-budgets': {
    scope: 'group',
    action: 'upload-series',
    body: (w) => ({ uploadId: w.budgetUploadId, regionSetId: w.regionSetId, terms: [{ variable: 'dic_tend', role: 'tendency' }, { variable: 'dic_adv', role: 'advection' }], depthLimits: [100], namePrefix: 'Walk budget' }),
  },
  'GET /api/mail/outbox': { scope: 'self' },
  // The captured invitation mail belongs to group A, whose only admin is `lead`.
  'GET /api/mail/outbox/{messageId}': { scope: 'custom', expect: (a) => (a === 'lead' ? 'ok' : 404) },
  'POST /api/groups/{groupId}/invitations': { scope: 'group', action: 'manage-members', body: () => ({ email: freshEmail(), role: 'member' }) },
  'GET /api/groups/{groupId}/invitations': { scope: 'group', action: 'manage-members' },
  'DELETE /api/groups/{groupId}/invitations/{invitationId}': { scope: 'group', action: 'manage-members' },
  'POST /api/notebooks/{notebookId}/invitations': { scope: 'notebook', action: 'manage-access', body: () => ({ email: freshEmail(), role: 'reader' }) },
  'GET /api/notebooks/{notebookId}/invitations': { scope: 'notebook', action: 'manage-access' },
  'DELETE /api/notebooks/{notebookId}/invitations/{invitationId}': { scope: 'notebook', action: 'manage-access' },
  'GET /api/invitations/{token}': { scope: 'public', capability: true },
  'POST /api/invitations/{token}/accept': { scope: 'public', capability: true, body: () => ({ name: 'Invited walker', password: 'correct horse battery' }) },
};

function freshEmail(): string {
  return `invitee.${Math.random().toString(36).slice(2)}@example.org`;
}

function commentOwnerOnly(a: Actor): 'ok' | 403 | 404 {
  if (a === 'lead') return 'ok';
  return NOTEBOOK_ROLE_OF[a] ? 403 : 404;
}

const importIndex = {
  origin: 'observation',
  columns: [{ column: 'index', skip: false, name: 'Walk index', kind: 'climate-index', variable: 'sst', units: 'degC' }],
};
const eventSet = { name: 'Walk events', events: [{ phase: 'warm', start: '2001-01', peak: '2001-06', end: '2001-12', label: 'walk' }] };

/** Ten years of a made-up monthly index, as CSV. */
export function indexCsv(): Buffer {
  const lines = ['date,index'];
  for (let t = 0; t < 120; t++) lines.push(`${2000 + Math.floor(t / 12)}-${String((t % 12) + 1).padStart(2, '0')}-15,${(Math.sin(t / 4) * 1.5).toFixed(4)}`);
  return Buffer.from(lines.join('\n') + '\n');
}

// A cut of the native-grid budget fixture (common/test-fixtures/scripts/grids_reference.py) and a polygon holding all of it.
const GRIDS_TINY_BUDGET = join(__dirname, '..', '..', 'common', 'test-fixtures', 'grids', 'grids_tiny_budget.nc');
const GLOBE = {
  type: 'FeatureCollection',
  features: [{ type: 'Feature', properties: { name: 'globe' }, geometry: { type: 'Polygon', coordinates: [[[-180, -89], [0, -89], [180, -89], [180, 89], [0, 89], [-180, 89], [-180, -89]]] } }],
};

/** Builds group A's things (a fresh group, notebook, series, upload, fields, event set, checkpoint, comments, notification). */
export async function buildWorld(url: string, p: People, dataDir: string): Promise<World> {
  const group = await buildGroup(url, p.lead, [p.coauthor, p.reviewer, p.reader, p.member, p.spare], 'Walk group A');
  const nb = await buildNotebook(url, group.id, p.lead, [[p.coauthor, 'co-author'], [p.reviewer, 'reviewer'], [p.reader, 'reader'], [p.spare, 'reader']]);
  const api = request(url);
  const up = (body: Buffer, name: string) => api.post(`/api/groups/${group.id}/uploads`).set(p.lead.auth).attach('file', body, { filename: name }).expect(201);
  const imported = (await api.post(`/api/uploads/${(await up(indexCsv(), 'index.csv')).body.uploadId}/import`).set(p.lead.auth).send(importIndex).expect(200)).body;
  const staged = (await up(indexCsv(), 'staged.csv')).body.uploadId as string;
  const nc = (await up(readFileSync(fixture('field-sinlat.nc')), 'field.nc')).body.uploadId as string;
  const grid = (await api.post(`/api/uploads/${nc}/import`).set(p.lead.auth).send({ grids: [{ variable: 'sinlat', name: 'Sine of latitude' }] }).expect(200)).body;
  const fieldId = grid.fields[0].id as string;
  const zonal = (await api.post(`/api/fields/${fieldId}/reductions`).set(p.lead.auth).send({ kind: 'zonal-mean', name: 'Zonal', lon: [0, 360] }).expect(200)).body;
  const nbPath = `/api/notebooks/${nb.id}`;
  const eventSetId = (await api.post(`${nbPath}/event-sets`).set(p.lead.auth).send(eventSet).expect(201)).body.id;
  const checkpointId = (await api.post(`${nbPath}/checkpoints`).set(p.lead.auth).send({ name: 'Walk start' }).expect(201)).body.id;
  const thread = (await api.post(`${nbPath}/comments`).set(p.lead.auth).send({ anchor: { type: 'figure', figureId: 'fig-1' }, body: 'Thread' }).expect(201)).body;
  const reply = (await api.post(`${nbPath}/comments/${thread.id}/replies`).set(p.lead.auth).send({ body: 'Reply', mentions: [p.reader.user.id] }).expect(201)).body;
  const replyId = (reply.replies?.at(-1)?.id ?? reply.id) as string;
  const notes = (await api.get('/api/notifications').set(p.reader.auth).expect(200)).body;
  const state = (await api.get(`${nbPath}/document`).set(p.lead.auth).expect(200)).body.state as string;
  const snapshotId = (await api.post(`${nbPath}/snapshots`).set(p.lead.auth).send({ title: 'Walk v1' }).expect(201)).body.id as string;
  const link = (await api.post(`/api/snapshots/${snapshotId}/share-links`).set(p.lead.auth).send({}).expect(201)).body;
  const notebookFile = (await api.get(`${nbPath}/export`).set(p.lead.auth).expect(200)).body;
  const invitee = freshEmail();
  const groupInvitationId = (await api.post(`/api/groups/${group.id}/invitations`).set(p.lead.auth).send({ email: invitee, role: 'member' }).expect(201)).body.id as string;
  const notebookInvitationId = (await api.post(`${nbPath}/invitations`).set(p.lead.auth).send({ email: freshEmail(), role: 'reader' }).expect(201)).body.id as string;
  const mail = await invitationMail(url, p.lead, invitee);
  // The outbox hides the link from the admin (it is the invitee's credential); the walk takes it from the stored mail.
  const stored = await mailTo(dataDir, invitee);
  const budgetUploadId = (await up(readFileSync(GRIDS_TINY_BUDGET), 'tiny-budget.nc')).body.uploadId as string;
  const regionSetId = (await api.post(`/api/groups/${group.id}/region-sets`).set(p.lead.auth).send({ name: 'Globe', source: { kind: 'geojson', geojson: GLOBE } }).expect(201)).body.id as string;
  return {
    groupId: group.id,
    notebookId: nb.id,
    seriesId: imported.series[0].id,
    stagedUploadId: staged,
    fieldId,
    zonalFieldId: zonal.zonal.id,
    eventSetId,
    checkpointId,
    threadId: thread.id,
    replyId,
    notificationId: notes.items[0].id,
    documentUpdate: paragraphUpdate(state),
    snapshotId,
    linkId: link.id,
    shareToken: link.token,
    notebookFile,
    groupInvitationId,
    notebookInvitationId,
    invitationToken: invitationToken(stored.text),
    messageId: mail.id,
    regionSetId,
    budgetUploadId,
  };
}

/** The invitation mail to `to` as the admin reads it in the local mailbox's outbox (it arrives asynchronously). */
async function invitationMail(url: string, admin: TestUser, to: string): Promise<{ id: string; text: string }> {
  for (let i = 0; i < 200; i++) {
    const box = (await request(url).get('/api/mail/outbox').set(admin.auth).expect(200)).body as { messages: { id: string; to: string[] | string; text: string }[] };
    const found = box.messages.find((m) => String(m.to).includes(to));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 25));
  }
  throw new Error(`route-walk: no invitation mail to ${to} reached the outbox`);
}

/** A Yjs update appending one paragraph to the document whose state is given (base64). */
function paragraphUpdate(stateB64: string): string {
  const doc = new Y.Doc();
  Y.applyUpdate(doc, Buffer.from(stateB64, 'base64'));
  const before = Y.encodeStateVector(doc);
  const p = new Y.XmlElement('paragraph');
  p.insert(0, [new Y.XmlText('walked')]);
  const frag = doc.getXmlFragment(DOCUMENT_FIELD);
  frag.insert(frag.length, [p]);
  return Buffer.from(Y.encodeStateAsUpdate(doc, before)).toString('base64');
}
