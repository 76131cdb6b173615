import { renderToHTMLString } from '@tiptap/static-renderer/pm/html-string';
import { LIVE_FIGURE, LIVE_NUMBER, upwellDocumentExtensions, type SnapshotView } from '@upwell/common';
import sanitizeHtml from 'sanitize-html';
import { escapeHtml } from '../../common/escape-html';
import { inlineFontFaces } from './fonts';
import { frozenFigureHtml } from './frozen-figure-html';
import { SNAPSHOT_CSS } from './styles';

/** The file's Content Security Policy: nothing loads from anywhere, nothing runs. */
export const SNAPSHOT_CSP = "default-src 'none'; img-src data:; style-src 'unsafe-inline'; font-src data:";

/**
 * Only what the document schema and this file's own markup produce; every other tag and
 * attribute is dropped, links keep only http(s) and mailto, images only inline SVG or PNG.
 */
const SANITIZE: sanitizeHtml.IOptions = {
  allowedTags: [
    'header', 'main', 'section', 'h1', 'h2', 'h3', 'h4', 'h5', 'h6', 'p', 'br', 'hr', 'strong', 'em', 's', 'u', 'code', 'pre',
    'blockquote', 'ul', 'ol', 'li', 'a', 'table', 'thead', 'tbody', 'tr', 'th', 'td', 'colgroup', 'col', 'figure', 'figcaption',
    'img', 'span', 'div', 'dl', 'dt', 'dd',
  ],
  allowedAttributes: {
    '*': ['class'],
    a: ['href', 'rel'],
    img: ['src', 'alt'],
    ol: ['start'],
    td: ['colspan', 'rowspan'],
    th: ['colspan', 'rowspan'],
  },
  allowedSchemes: ['http', 'https', 'mailto'],
  allowedSchemesByTag: { img: ['data'] },
  allowProtocolRelative: false,
  exclusiveFilter: (frame) => frame.tag === 'img' && !/^data:image\/(svg\+xml|png);base64,[A-Za-z0-9+/=]+$/.test(frame.attribs.src ?? ''),
  transformTags: { a: sanitizeHtml.simpleTransform('a', { rel: 'noopener noreferrer' }) },
};

/** The body HTML of the frozen document: live figures as frozen figures, live numbers as their frozen text. */
async function documentHtml(snapshot: SnapshotView): Promise<string> {
  const figures = await Promise.all(snapshot.figures.map(frozenFigureHtml));
  let figureIndex = 0;
  let numberIndex = 0;
  return renderToHTMLString({
    content: snapshot.document as never,
    extensions: upwellDocumentExtensions(),
    options: {
      nodeMapping: {
        [LIVE_FIGURE]: () => figures[figureIndex++] ?? '',
        [LIVE_NUMBER]: () => `<span class="live-number">${escapeHtml(snapshot.numbers[numberIndex++]?.text ?? 'n/a')}</span>`,
      },
    },
  });
}

/** The header: which notebook, which snapshot, who published it when, and what the figures are. */
function headerHtml(s: SnapshotView): string {
  const modelOutput = s.figures.some((f) => f.result?.used.some((u) => u.origin === 'model-output'));
  const when = new Date(s.publishedAt).toISOString().replace('T', ' ').slice(0, 16) + ' UTC';
  return (
    `<header class="snapshot"><p class="notebook">${escapeHtml(s.notebookTitle)} — ${escapeHtml(s.groupName)}</p>` +
    `<h1>Snapshot ${s.number}: ${escapeHtml(s.title)}</h1>` +
    `<dl><dt>Published</dt><dd>${escapeHtml(when)}</dd><dt>By</dt><dd>${escapeHtml(s.publishedBy?.name ?? 'a former member')}</dd>` +
    `<dt>Content sha256</dt><dd><code>${escapeHtml(s.contentSha256)}</code></dd></dl>` +
    (s.releaseNote ? `<p class="release-note">${escapeHtml(s.releaseNote)}</p>` : '') +
    `<p class="notice">Figures and numbers are frozen as they were computed at publication; later versions of their series do not change them.</p>` +
    (modelOutput ? `<p class="notice">Some figures use model output. Model output is model output, not observation.</p>` : '') +
    `</header>`
  );
}

/**
 * The snapshot as one self-contained HTML file: fonts and figures as data: URIs, a strict CSP,
 * no script. The body passes through sanitize-html as defence in depth, after the renderer's
 * own escaping.
 */
export async function snapshotHtml(snapshot: SnapshotView): Promise<string> {
  const body = sanitizeHtml(`<main>${headerHtml(snapshot)}<section class="document">${await documentHtml(snapshot)}</section></main>`, SANITIZE);
  const title = `${snapshot.notebookTitle} — snapshot ${snapshot.number}`;
  return (
    `<!DOCTYPE html>\n<html lang="en"><head><meta charset="utf-8">` +
    `<meta http-equiv="Content-Security-Policy" content="${SNAPSHOT_CSP}">` +
    `<meta name="viewport" content="width=device-width, initial-scale=1">` +
    `<title>${escapeHtml(title)}</title><style>${inlineFontFaces()}\n${SNAPSHOT_CSS}</style></head>` +
    `<body>${body}</body></html>\n`
  );
}

/** "the-warm-event-of-1997-v3.html": the file name of a snapshot. */
export function snapshotFileName(notebookTitle: string, number: number): string {
  const slug = notebookTitle.toLowerCase().normalize('NFKD').replace(/[\u0300-\u036f]/g, '').replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 80) || 'notebook';
  return `${slug}-v${number}.html`;
}
