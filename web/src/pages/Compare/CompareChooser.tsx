import { Button, Flex, Text } from '@radix-ui/themes';
import { useId, useState, type FormEvent } from 'react';
import type { SnapshotSummary } from '@upwell/common';
import './compare.css';

/** Picks what to compare: a snapshot, and another snapshot of the same notebook or the live notebook. */
export function CompareChooser({
  snapshots,
  from: initialFrom,
  to: initialTo,
  onCompare,
}: {
  snapshots: SnapshotSummary[];
  from?: string | null;
  to?: string | null;
  onCompare: (from: string, to: string) => void;
}) {
  const [from, setFrom] = useState(initialFrom ?? snapshots[0]?.id ?? '');
  const [to, setTo] = useState(initialTo ?? 'live');
  const fromId = useId();
  const toId = useId();
  const same = from === to;
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (from && to && !same) onCompare(from, to);
  };
  if (snapshots.length === 0) return null;
  const label = (s: SnapshotSummary) => `v${s.number} — ${s.title}`;
  return (
    <form onSubmit={submit} aria-label="Choose what to compare" className="upwell-compare-chooser">
      <Flex gap="3" align="end" wrap="wrap">
        <div className="upwell-field">
          <label htmlFor={fromId}>Compare</label>
          <select id={fromId} value={from} onChange={(e) => setFrom(e.target.value)}>
            {snapshots.map((s) => (
              <option key={s.id} value={s.id}>
                {label(s)}
              </option>
            ))}
          </select>
        </div>
        <div className="upwell-field">
          <label htmlFor={toId}>with</label>
          <select id={toId} value={to} onChange={(e) => setTo(e.target.value)}>
            <option value="live">The live notebook</option>
            {snapshots.map((s) => (
              <option key={s.id} value={s.id}>
                {label(s)}
              </option>
            ))}
          </select>
        </div>
        <Button type="submit" disabled={same}>
          Compare
        </Button>
        {same && (
          <Text size="2" color="gray" role="status">
            Choose two different versions.
          </Text>
        )}
      </Flex>
    </form>
  );
}
