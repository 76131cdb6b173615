import { Badge, Flex, Heading, Table, Text, VisuallyHidden } from '@radix-ui/themes';
import { useMemo, useState } from 'react';
import type { FigureChange, NumberChange, SnapshotComparison } from '@upwell/common';
import { TableCaption } from '../../components/TableCaption';
import { formatWhen } from '../../components/dates';
import { comparedName, diffParagraphs, formatChange, formatCompared, seriesLine, STATUS_WORDS, type DiffRun } from './compare-format';
import './compare.css';

type Side = SnapshotComparison['from'] | SnapshotComparison['to'];

/** "Snapshot v2 — Sent to reviewers (1 Dec 2026, 18:40)" or "the live notebook (as of …)". */
export function sideName(side: Side): string {
  return side.kind === 'live' ? `the live notebook (as of ${formatWhen(side.at)})` : `Snapshot v${side.number} — ${side.title} (${formatWhen(side.publishedAt)})`;
}

/** One run of the text diff: inserted words underlined, deleted ones struck through, each announced to screen readers. */
function Run({ run }: { run: DiffRun }) {
  if (run.op === 'equal') return <>{run.text}</>;
  if (run.op === 'insert') {
    return (
      <ins className="upwell-diff-ins">
        <VisuallyHidden>[inserted: </VisuallyHidden>
        {run.text}
        <VisuallyHidden>]</VisuallyHidden>
      </ins>
    );
  }
  return (
    <del className="upwell-diff-del">
      <VisuallyHidden>[deleted: </VisuallyHidden>
      {run.text}
      <VisuallyHidden>]</VisuallyHidden>
    </del>
  );
}

function TextDiff({ ops }: { ops: DiffRun[] }) {
  const [onlyChanged, setOnlyChanged] = useState(false);
  const paragraphs = useMemo(() => diffParagraphs(ops), [ops]);
  const changed = (p: DiffRun[]) => p.some((r) => r.op !== 'equal');
  const shown = onlyChanged ? paragraphs.filter(changed) : paragraphs;
  const words = (op: 'insert' | 'delete') => {
    const n = ops.filter((o) => o.op === op).reduce((sum, o) => sum + (o.text.match(/\S+/g)?.length ?? 0), 0);
    return `${n} ${n === 1 ? 'word' : 'words'}`;
  };
  return (
    <section aria-labelledby="compare-text-heading">
      <Heading as="h2" size="4" id="compare-text-heading" mb="2">
        Text
      </Heading>
      <Flex gap="4" wrap="wrap" align="center" mb="2">
        <Text size="2" color="gray">
          {words('insert')} inserted, {words('delete')} deleted. <ins className="upwell-diff-ins">Underlined</ins> text was inserted,{' '}
          <del className="upwell-diff-del">struck-through</del> text was deleted.
        </Text>
        <Text as="label" size="2">
          <input type="checkbox" checked={onlyChanged} onChange={(e) => setOnlyChanged(e.target.checked)} /> Only paragraphs with changes
        </Text>
      </Flex>
      <div className="upwell-sheet upwell-diff" aria-label="Text changes">
        {shown.length === 0 ? (
          <p className="upwell-muted">{onlyChanged ? 'No paragraph changed.' : 'The document has no text.'}</p>
        ) : (
          shown.map((p, i) => (
            <p key={i} className={changed(p) ? 'upwell-diff-changed' : undefined}>
              {p.map((r, j) => (
                <Run key={j} run={r} />
              ))}
            </p>
          ))
        )}
      </div>
    </section>
  );
}

function Status({ status }: { status: keyof typeof STATUS_WORDS }) {
  const color = status === 'unchanged' ? 'gray' : status === 'removed' ? 'red' : status === 'added' ? 'teal' : 'amber';
  return (
    <Badge color={color} variant="soft">
      {STATUS_WORDS[status]}
    </Badge>
  );
}

function FigureDiff({ f }: { f: FigureChange }) {
  const name = comparedName('Figure', f.ordinalBefore, f.ordinalAfter);
  const seriesBefore = seriesLine(f.seriesBefore);
  const seriesAfter = seriesLine(f.seriesAfter);
  return (
    <div className="upwell-compare-figure" role="group" aria-label={name}>
      <Flex gap="2" align="center" mb="1">
        <Heading as="h3" size="3">
          {name}
        </Heading>
        <Status status={f.status} />
      </Flex>
      {f.captionBefore !== f.captionAfter && (
        <Text as="p" size="2">
          Caption: {f.captionBefore !== null && <del className="upwell-diff-del">{f.captionBefore || '(none)'}</del>}
          {f.captionBefore !== null && f.captionAfter !== null && ' → '}
          {f.captionAfter !== null && <ins className="upwell-diff-ins">{f.captionAfter || '(none)'}</ins>}
        </Text>
      )}
      {f.recipeChanged && (
        <Text as="p" size="2">
          Its settings changed (what it shows, its series, or its parameters).
        </Text>
      )}
      <Text as="p" size="2">
        Data: {seriesBefore === seriesAfter ? <span className="upwell-mono">{seriesAfter}</span> : (
          <>
            <span className="upwell-mono">{seriesBefore}</span> → <span className="upwell-mono">{seriesAfter}</span>
          </>
        )}
      </Text>
      {f.values.length > 0 && (
        <Table.Root size="1" variant="surface" className="upwell-numbers">
          <TableCaption>{`Values of ${name}`}</TableCaption>
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>Value</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Before</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>After</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Change</Table.ColumnHeaderCell>
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {f.values.map((v) => (
              <Table.Row key={v.key}>
                <Table.RowHeaderCell>{v.label}</Table.RowHeaderCell>
                <Table.Cell>{formatCompared(v.before, v.units)}</Table.Cell>
                <Table.Cell>{formatCompared(v.after, v.units)}</Table.Cell>
                <Table.Cell>{formatChange(v.before, v.after, v.units)}</Table.Cell>
              </Table.Row>
            ))}
          </Table.Body>
        </Table.Root>
      )}
    </div>
  );
}

function NumbersDiff({ numbers }: { numbers: NumberChange[] }) {
  return (
    <section aria-labelledby="compare-numbers-heading">
      <Heading as="h2" size="4" id="compare-numbers-heading" mb="2">
        Live numbers
      </Heading>
      {numbers.length === 0 ? (
        <Text size="2" color="gray">
          Neither side has live numbers.
        </Text>
      ) : (
        <Table.Root size="1" variant="surface" className="upwell-numbers">
          <TableCaption>Live numbers before and after</TableCaption>
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>Number</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Before</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>After</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Change</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Status</Table.ColumnHeaderCell>
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {numbers.map((n, i) => (
              <Table.Row key={`${n.ordinalBefore}-${n.ordinalAfter}-${n.key}-${i}`}>
                <Table.RowHeaderCell>
                  {comparedName('Number', n.ordinalBefore, n.ordinalAfter)} <span className="upwell-mono">{n.key}</span>
                </Table.RowHeaderCell>
                <Table.Cell>{n.textBefore ?? '—'}</Table.Cell>
                <Table.Cell>{n.textAfter ?? '—'}</Table.Cell>
                <Table.Cell>{formatChange(n.before, n.after, n.units)}</Table.Cell>
                <Table.Cell>
                  <Status status={n.status} />
                </Table.Cell>
              </Table.Row>
            ))}
          </Table.Body>
        </Table.Root>
      )}
    </section>
  );
}

/**
 * What changed between two snapshots, or a snapshot and the live notebook:
 * the text word by word (marked by underline and strike-through, not by
 * colour alone), then each figure's and each live number's old and new
 * values side by side with the change.
 */
export function CompareView({ comparison }: { comparison: SnapshotComparison }) {
  const changedFigures = comparison.figures.filter((f) => f.status !== 'unchanged').length;
  return (
    <Flex direction="column" gap="5">
      <Text as="p" size="2">
        From <strong>{sideName(comparison.from)}</strong> to <strong>{sideName(comparison.to)}</strong>.
      </Text>
      {comparison.to.kind === 'live' && (
        <Text as="p" size="2" color="gray">
          The live side is computed now from the current data; it will differ again after new edits or new series versions.
        </Text>
      )}
      <TextDiff ops={comparison.text} />
      <section aria-labelledby="compare-figures-heading">
        <Heading as="h2" size="4" id="compare-figures-heading" mb="2">
          Figures
        </Heading>
        <Text as="p" size="2" color="gray" mb="2">
          {comparison.figures.length === 0 ? 'Neither side has figures.' : `${changedFigures} of ${comparison.figures.length} figures differ.`}
        </Text>
        <Flex direction="column" gap="4">
          {comparison.figures.map((f) => (
            <FigureDiff key={f.figureId} f={f} />
          ))}
        </Flex>
      </section>
      <NumbersDiff numbers={comparison.numbers} />
    </Flex>
  );
}
