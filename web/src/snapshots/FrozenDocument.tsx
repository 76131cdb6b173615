import { Node as PMNode, type Mark } from '@tiptap/pm/model';
import { renderToReactElement } from '@tiptap/static-renderer/pm/react';
import { useMemo, type ReactNode } from 'react';
import { LIVE_FIGURE, LIVE_NUMBER, upwellDocumentExtensions, upwellSchema, visitEditorLiveNodes, type FrozenFigure, type FrozenNumber, type PmNodeLike, type SnapshotView } from '@upwell/common';
import { FrozenFigureView } from '../figures/FrozenFigureView';
import { safeHref } from './safe-href';

/** What the frozen renderer needs of a snapshot. */
export type FrozenContent = Pick<SnapshotView, 'document' | 'figures' | 'numbers'>;

/** A live number as it read at publishing; it says where it came from on hover, and in print it is plain text. */
function FrozenNumberText({ number, figureOrdinal }: { number: FrozenNumber | undefined; figureOrdinal: number | null }) {
  if (!number) return <span className="upwell-frozen-number upwell-live-number-unavailable">n/a</span>;
  const unavailable = number.value === null || number.error !== null;
  const from = figureOrdinal ? `from Figure ${figureOrdinal}` : 'from its recipe';
  const why = number.error ? `; ${number.error}` : '';
  return (
    <span
      className={`upwell-frozen-number${unavailable ? ' upwell-live-number-unavailable' : ''}`}
      data-number-ordinal={number.ordinal}
      title={`Number ${number.ordinal}, ${from}, as computed when the snapshot was published${why}`}
    >
      {unavailable && <span aria-hidden>⚠ </span>}
      {number.text}
    </span>
  );
}

/** A link mark: only http(s) and mailto addresses stay links; anything else (javascript:, data:) is plain text. */
function FrozenLink({ mark, children }: { mark: Mark; children?: ReactNode }) {
  const href = safeHref(mark.attrs.href);
  if (!href) return <span className="upwell-link-removed">{children}</span>;
  return (
    <a href={href} rel="noopener noreferrer nofollow">
      {children}
    </a>
  );
}

/** Renders the children of a node or mark the schema does not know, without its own markup. */
const passThrough = ({ children }: { children?: ReactNode }) => <>{children}</>;

/**
 * Matches each liveFigure node to its frozen figure (by id, else by order) and
 * each liveNumber node to its frozen number (by order), as the server froze
 * them in document order.
 */
function matchFrozen(doc: PMNode, content: FrozenContent) {
  const figures = new Map<PMNode, FrozenFigure>();
  const numbers = new Map<PMNode, FrozenNumber>();
  const byId = new Map(content.figures.map((f) => [f.figureId, f]));
  const inOrder = [...content.figures].sort((a, b) => a.ordinal - b.ordinal);
  const numbersInOrder = [...content.numbers].sort((a, b) => a.ordinal - b.ordinal);
  let f = 0;
  let n = 0;
  visitEditorLiveNodes(doc as unknown as PmNodeLike, {
    figure: (attrs, node) => {
      const frozen = byId.get(attrs.id) ?? inOrder[f];
      if (frozen) figures.set(node as unknown as PMNode, frozen);
      f += 1;
    },
    number: (_attrs, node) => {
      const frozen = numbersInOrder[n];
      if (frozen) numbers.set(node as unknown as PMNode, frozen);
      n += 1;
    },
  });
  return { figures, numbers, ordinalOf: (figureId: string | null) => (figureId ? (byId.get(figureId)?.ordinal ?? null) : null) };
}

/** The document's text only, block by block: what is left to show when the stored document cannot be read by the schema. */
function plainBlocks(json: unknown): string[] {
  const blocks: string[] = [];
  const textOf = (n: unknown): string => {
    if (!n || typeof n !== 'object') return '';
    const node = n as { text?: unknown; content?: unknown };
    if (typeof node.text === 'string') return node.text;
    return Array.isArray(node.content) ? node.content.map(textOf).join('') : '';
  };
  const content = (json as { content?: unknown }).content;
  if (Array.isArray(content)) for (const block of content) blocks.push(textOf(block));
  return blocks.filter((b) => b.trim() !== '');
}

function render(content: FrozenContent): { element: ReactNode; error: string | null } {
  let doc: PMNode;
  try {
    doc = PMNode.fromJSON(upwellSchema(), content.document);
  } catch (e) {
    const reason = e instanceof Error ? e.message : String(e);
    return {
      error: `Part of this snapshot’s document does not fit Upwell’s document schema (${reason}); its text is shown without formatting.`,
      element: plainBlocks(content.document).map((text, i) => <p key={i}>{text}</p>),
    };
  }
  const { figures, numbers, ordinalOf } = matchFrozen(doc, content);
  const element = renderToReactElement({
    content: doc,
    extensions: upwellDocumentExtensions(),
    options: {
      nodeMapping: {
        [LIVE_FIGURE]: ({ node }) => {
          const frozen = figures.get(node);
          return frozen ? (
            <FrozenFigureView figure={frozen} />
          ) : (
            <p className="upwell-figure-empty" role="note">
              A figure stood here; the snapshot holds no frozen result for it.
            </p>
          );
        },
        [LIVE_NUMBER]: ({ node }) => {
          const frozen = numbers.get(node);
          return <FrozenNumberText number={frozen} figureOrdinal={ordinalOf(frozen?.figureId ?? null)} />;
        },
      },
      markMapping: { link: FrozenLink },
      unhandledNode: passThrough,
      unhandledMark: passThrough,
    },
  });
  return { element, error: null };
}

/**
 * A snapshot's document, read-only, rendered by React from its stored
 * ProseMirror JSON (never as HTML strings): text with the shared schema,
 * live figures drawn from their frozen results, live numbers as their frozen
 * text. Nothing here fetches.
 */
export function FrozenDocument({ content }: { content: FrozenContent }) {
  const { element, error } = useMemo(() => render(content), [content]);
  return (
    <div className="upwell-document upwell-frozen-document">
      {error && (
        <p className="upwell-read-only-note" role="note">
          {error}
        </p>
      )}
      <div className="upwell-document-body">{element}</div>
    </div>
  );
}
