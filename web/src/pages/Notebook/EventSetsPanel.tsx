import { Box, Button, Flex, Heading, Select, Table, Text, TextField } from '@radix-ui/themes';
import { useState } from 'react';
import { DEFAULT_EVENT_SOURCE, type EventSetView } from '@upwell/common';
import { useEventSets, type EditableEvent } from '../../api/event-sets';
import { useSeriesList } from '../../api/series';
import { ErrorNote } from '../../components/ErrorNote';
import { TableCaption } from '../../components/TableCaption';

const MONTH = /^\d{4}-(0[1-9]|1[0-2])$/;

/** An editable table of events: add, remove, move the peak, relabel. */
function EventTable({ events, onChange, editable, caption }: { events: EditableEvent[]; onChange: (e: EditableEvent[]) => void; editable: boolean; caption: string }) {
  const set = (i: number, patch: Partial<EditableEvent>) => onChange(events.map((e, j) => (j === i ? { ...e, ...patch } : e)));
  const cell = (i: number, k: 'start' | 'peak' | 'end') =>
    editable ? (
      <TextField.Root size="1" className="upwell-mono" aria-label={`${k} of event ${i + 1}`} value={events[i][k]} onChange={(e) => set(i, { [k]: e.target.value })} color={MONTH.test(events[i][k]) ? undefined : 'red'} style={{ width: 90 }} />
    ) : (
      <span className="upwell-mono">{events[i][k]}</span>
    );
  return (
    <Table.Root size="1" variant="surface">
      <TableCaption>{caption}</TableCaption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Phase</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Start</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Peak</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>End</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Label</Table.ColumnHeaderCell>
          {editable && <Table.ColumnHeaderCell />}
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {events.map((e, i) => (
          <Table.Row key={i}>
            <Table.Cell>
              {editable ? (
                <Select.Root size="1" value={e.phase} onValueChange={(v) => set(i, { phase: v as 'warm' | 'cold' })}>
                  <Select.Trigger aria-label={`phase of event ${i + 1}`} />
                  <Select.Content>
                    <Select.Item value="warm">Warm</Select.Item>
                    <Select.Item value="cold">Cold</Select.Item>
                  </Select.Content>
                </Select.Root>
              ) : (
                <Text color={e.phase === 'warm' ? 'red' : 'blue'}>{e.phase === 'warm' ? 'Warm' : 'Cold'}</Text>
              )}
            </Table.Cell>
            <Table.Cell>{cell(i, 'start')}</Table.Cell>
            <Table.Cell>{cell(i, 'peak')}</Table.Cell>
            <Table.Cell>{cell(i, 'end')}</Table.Cell>
            <Table.Cell>{editable ? <TextField.Root size="1" aria-label={`label of event ${i + 1}`} value={e.label} onChange={(ev) => set(i, { label: ev.target.value })} /> : e.label}</Table.Cell>
            {editable && (
              <Table.Cell>
                <Button size="1" variant="ghost" color="red" onClick={() => onChange(events.filter((_, j) => j !== i))} aria-label={`Remove event ${i + 1}`}>
                  Remove
                </Button>
              </Table.Cell>
            )}
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}

function SavedSet({ notebookId, set, editable }: { notebookId: string; set: EventSetView; editable: boolean }) {
  const sets = useEventSets(notebookId);
  const [events, setEvents] = useState<EditableEvent[]>(set.events);
  const changed = JSON.stringify(events) !== JSON.stringify(set.events);
  return (
    <Box mb="4">
      <Flex justify="between" align="center" mb="1">
        <Text weight="bold">
          {set.name} · {set.events.length} events
        </Text>
        {editable && (
          <Flex gap="2">
            <Button size="1" variant="soft" onClick={() => setEvents([...events, { phase: 'warm', start: '', peak: '', end: '', label: '' }])}>
              Add event
            </Button>
            <Button size="1" disabled={!changed} loading={sets.update.isPending} onClick={() => sets.update.mutate({ id: set.id, body: { name: set.name, events } })}>
              Save changes
            </Button>
            <Button size="1" variant="soft" color="red" onClick={() => sets.remove.mutate(set.id)}>
              Delete set
            </Button>
          </Flex>
        )}
      </Flex>
      <EventTable events={events} onChange={setEvents} editable={editable} caption={`Events of ${set.name}`} />
      <ErrorNote error={sets.update.error ?? sets.remove.error} />
    </Box>
  );
}

/** The notebook's event sets: detected from an index by the engine's rule, then edited and saved. */
export function EventSetsPanel({ notebookId, groupId, editable }: { notebookId: string; groupId: string; editable: boolean }) {
  const sets = useEventSets(notebookId);
  const series = useSeriesList(groupId, { pageSize: 200, sort: 'name' });
  const [indexId, setIndexId] = useState('');
  // The rule's defaults as the schema states them (DEFAULT_EVENT_SOURCE is its parse of { from: 'rule' }).
  const [threshold, setThreshold] = useState(String(DEFAULT_EVENT_SOURCE.threshold));
  const [minDuration, setMinDuration] = useState(String(DEFAULT_EVENT_SOURCE.minDuration));
  const [smooth, setSmooth] = useState(String(DEFAULT_EVENT_SOURCE.smooth));
  const [draft, setDraft] = useState<EditableEvent[] | null>(null);
  const [name, setName] = useState('Warm and cold events');

  return (
    <section aria-labelledby="event-sets-heading">
      <Heading as="h2" size="4" id="event-sets-heading" mb="2">
        Event sets
      </Heading>
      <Text as="p" size="2" color="gray" mb="3">
        Events found in an index by the operational rule (anomaly beyond ±threshold for at least the minimum number of consecutive
        months, after smoothing), saved for this notebook and edited by hand where the authors judge differently.
      </Text>
      <ErrorNote error={sets.list.error} />
      {(sets.list.data ?? []).map((s) => (
        <SavedSet key={s.id + s.updatedAt} notebookId={notebookId} set={s} editable={editable} />
      ))}
      {sets.list.data?.length === 0 && !editable && <Text size="2">No event sets saved yet.</Text>}
      {editable && (
        <Box className="upwell-sheet" p="3">
          <Flex gap="2" align="end" wrap="wrap">
            <label>
              <Text as="div" size="1" weight="bold">
                Index
              </Text>
              <Select.Root value={indexId} onValueChange={setIndexId}>
                <Select.Trigger placeholder="Choose an index series" aria-label="Index for event detection" />
                <Select.Content>
                  {(series.data?.items ?? []).map((s) => (
                    <Select.Item key={s.id} value={s.id}>
                      {s.name}
                    </Select.Item>
                  ))}
                </Select.Content>
              </Select.Root>
            </label>
            <label>
              <Text as="div" size="1" weight="bold">
                Threshold
              </Text>
              <TextField.Root size="2" aria-label="Event threshold" value={threshold} onChange={(e) => setThreshold(e.target.value)} style={{ width: 70 }} />
            </label>
            <label>
              <Text as="div" size="1" weight="bold">
                Minimum months
              </Text>
              <TextField.Root size="2" aria-label="Minimum event duration in months" value={minDuration} onChange={(e) => setMinDuration(e.target.value)} style={{ width: 70 }} />
            </label>
            <label>
              <Text as="div" size="1" weight="bold">
                Smoothing (months)
              </Text>
              <TextField.Root size="2" aria-label="Smoothing before detection" value={smooth} onChange={(e) => setSmooth(e.target.value)} style={{ width: 70 }} />
            </label>
            <Button
              disabled={!indexId}
              loading={sets.detect.isPending}
              onClick={() =>
                sets.detect.mutate(
                  { index: { seriesId: indexId, version: 'latest' }, rule: { from: 'rule', threshold: Number(threshold), minDuration: Number(minDuration), smooth: Number(smooth) } },
                  { onSuccess: (r) => setDraft(r.events.map((e) => ({ phase: e.phase, start: e.start, peak: e.peak, end: e.end, label: e.label ?? '' }))) },
                )
              }
            >
              Detect events
            </Button>
          </Flex>
          <ErrorNote error={sets.detect.error} />
          {draft && (
            <Box mt="3">
              <EventTable events={draft} onChange={setDraft} editable caption="Detected events" />
              <Flex gap="2" mt="2" align="center">
                <TextField.Root aria-label="Name of the event set" value={name} onChange={(e) => setName(e.target.value)} style={{ minWidth: 260 }} />
                <Button
                  loading={sets.create.isPending}
                  onClick={() =>
                    sets.create.mutate(
                      { name, events: draft, derivedFrom: { index: { seriesId: indexId, version: 'latest' }, rule: { from: 'rule', threshold: Number(threshold), minDuration: Number(minDuration), smooth: Number(smooth) } } },
                      { onSuccess: () => setDraft(null) },
                    )
                  }
                >
                  Save event set
                </Button>
              </Flex>
              <ErrorNote error={sets.create.error} />
            </Box>
          )}
        </Box>
      )}
    </section>
  );
}
