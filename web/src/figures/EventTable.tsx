import { formatValue, type EventTableData } from '@upwell/common';

const cell = (v: number | null | undefined, p: number) => (v === null || v === undefined ? '—' : formatValue(v, p));

/** The event table as an HTML table (reads and prints as text, copies into a manuscript). */
export function EventTable({ data, label }: { data: EventTableData; label: string }) {
  const carbon = data.carbonSeries;
  if (data.rows.length === 0) {
    return <p className="upwell-figure-empty">No events met the rule in this period. Try a lower threshold or a shorter minimum duration.</p>;
  }
  return (
    <table className="upwell-event-table upwell-numbers" aria-label={label}>
      <thead>
        <tr>
          <th scope="col">Phase</th>
          <th scope="col">Start</th>
          <th scope="col">Peak</th>
          <th scope="col">End</th>
          <th scope="col">Months</th>
          <th scope="col">Peak index</th>
          <th scope="col">Strength</th>
          {carbon.map((c) => (
            <th scope="col" key={c.seriesId}>
              {c.name} (Pg C)
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {data.rows.map((e) => (
          <tr key={`${e.phase}-${e.start}`}>
            <th scope="row" className={`upwell-phase upwell-phase-${e.phase}`}>
              {e.phase === 'warm' ? 'Warm' : 'Cold'}
            </th>
            <td>{e.start}</td>
            <td>{e.peak}</td>
            <td>{e.end}</td>
            <td>{e.months}</td>
            <td>{cell(e.peakValue, 2)}</td>
            <td>{e.strength ?? ''}</td>
            {carbon.map((c) => (
              <td key={c.seriesId}>{cell(e.carbon[c.seriesId], 2)}</td>
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
