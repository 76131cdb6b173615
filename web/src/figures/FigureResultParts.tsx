import { useMemo } from 'react';
import { figureData, formatVersionsUsed, specForResult, type FigureResult } from '@upwell/common';
import { LazyVegaFigure } from '../charts/LazyVegaFigure';
import { EventTable } from './EventTable';

/** The methods note: the server's sentence, then the data versions it used (live and frozen figures alike). */
export function MethodsNote({ result }: { result: FigureResult }) {
  return (
    <div className="upwell-methods">
      <p>
        <span className="upwell-methods-label">Methods.</span> {result.methods}
      </p>
      <p className="upwell-provenance">
        <span className="upwell-methods-label">Data.</span> <span className="upwell-mono">{formatVersionsUsed(result.used)}</span>
      </p>
      {result.cautions.length > 0 && (
        <ul className="upwell-cautions" aria-label="Cautions">
          {result.cautions.map((c) => (
            <li key={c}>Caution: {c}</li>
          ))}
        </ul>
      )}
      {result.warnings.length > 0 && (
        <ul className="upwell-cautions" aria-label="Warnings">
          {result.warnings.map((w) => (
            <li key={w}>{w}</li>
          ))}
        </ul>
      )}
    </div>
  );
}

/** The picture of a computed result: a vega-lite chart, or the event table. Renders from the result alone, without fetching. */
export function FigureChart({ result, label }: { result: FigureResult; label: string }) {
  const spec = useMemo(() => specForResult(result), [result]);
  if (result.kind === 'event-table') return <EventTable data={figureData('event-table', result)} label={label} />;
  return spec ? <LazyVegaFigure spec={spec} label={label} /> : null;
}
