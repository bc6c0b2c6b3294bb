// The wire positions of a saved span: each with its readings (newest first) and a "new reading" action.
import { useState } from 'preact/hooks';
import type { RecordSet } from '../../../core/records/kinds';
import type { LineRecord } from '../../../core/records/line';
import type { SpanRecord } from '../../../core/records/span';
import { useData } from '../../app/context';
import { readingContext, solveReading } from '../../app/derive';
import { show, showTime } from '../../app/format';
import { readField } from '../../app/read-field';
import { href } from '../../app/router';
import { Badge } from '../../components/badge/Badge';
import { Button, LinkButton } from '../../components/button/Button';
import { NumberField } from '../../components/field/NumberField';
import { TextField } from '../../components/field/TextField';
import { WireVerdict } from '../../components/verdict/WireVerdict';
import { methodTitle } from '../reading/methods';

function AddWire({ line, span, onAdded }: { line: LineRecord; span: SpanRecord; onAdded: () => void }) {
  const data = useData();
  const units = line.unitSystem;
  const [open, setOpen] = useState(false);
  const [label, setLabel] = useState('');
  const [near, setNear] = useState('');
  const [far, setFar] = useState('');
  const [error, setError] = useState<string | null>(null);
  const nearRead = readField(near, 'length', units);
  const farRead = readField(far, 'length', units);
  const unit = show(0, 'length', units).split(' ')[1];
  if (!open) {
    return <Button onClick={() => setOpen(true)}>+ Add wire position</Button>;
  }
  const add = async (): Promise<void> => {
    if (label.trim() === '') {
      setError('Give the wire a label, e.g. A, B, C or N.');
      return;
    }
    if (nearRead.error || farRead.error) return;
    await data.save('wire', {
      lineId: line.id,
      spanId: span.id,
      label: label.trim(),
      nearOffset: nearRead.value ?? 0,
      farOffset: farRead.value ?? 0,
    });
    setOpen(false);
    setLabel('');
    onAdded();
  };
  return (
    <div class="panel">
      <TextField id="wire-label" label="Wire label" value={label} onInput={setLabel} error={error} />
      <div class="grid-2">
        <NumberField
          id="wire-near"
          label="Near attachment offset (optional)"
          hint="Above (+) or below (−) the span's near attachment elevation."
          unit={unit}
          value={near}
          onInput={setNear}
          error={nearRead.error}
        />
        <NumberField
          id="wire-far"
          label="Far attachment offset (optional)"
          hint="Above (+) or below (−) the span's far attachment elevation."
          unit={unit}
          value={far}
          onInput={setFar}
          error={farRead.error}
        />
      </div>
      <div class="btn-row">
        <Button look="primary" onClick={() => void add()}>
          Add wire
        </Button>
        <Button onClick={() => setOpen(false)}>Cancel</Button>
      </div>
    </div>
  );
}

export function WireList({
  records,
  line,
  span,
  onChanged,
}: {
  records: RecordSet;
  line: LineRecord;
  span: SpanRecord;
  onChanged: () => void;
}) {
  const units = line.unitSystem;
  const wires = records.wire.filter((wire) => wire.spanId === span.id);
  return (
    <div class="wires">
      <h2>Wires and readings</h2>
      {wires.length === 0 && <p class="empty">No wire positions yet: add one to take readings.</p>}
      {wires.map((wire) => {
        const readings = records.reading
          .filter((reading) => reading.wireId === wire.id)
          .sort((a, b) => b.takenAt.localeCompare(a.takenAt));
        return (
          <article class="wire-card" key={wire.id} aria-label={`Wire ${wire.label}`}>
            <header class="wire-card__head">
              <span class="wire-card__label">{wire.label}</span>
              <LinkButton
                look="primary"
                href={`${href('line', line.id, 'span', span.id, 'reading')}?wire=${wire.id}`}
              >
                New reading
              </LinkButton>
            </header>
            <WireVerdict records={records} wireId={wire.id} withReason />
            {readings.length === 0 ? (
              <p class="muted">No readings yet.</p>
            ) : (
              <ul class="list">
                {readings.map((reading) => {
                  const solved = solveReading(readingContext(records, reading));
                  return (
                    <li key={reading.id}>
                      <a class="reading-link" href={href('line', line.id, 'reading', reading.id)}>
                        <span class="reading-link__method">{methodTitle(reading.measurement.method)}</span>
                        {solved.ok ? (
                          <span class="reading-link__figures">
                            H {show(solved.solution.horizontalTension, 'tension', units)} · sag{' '}
                            {show(solved.solution.midspanSag, 'sag', units)}
                          </span>
                        ) : (
                          <Badge tone="bad">cannot solve</Badge>
                        )}
                        <span class="muted small">
                          {showTime(reading.takenAt)} ·{' '}
                          {show(reading.conductorTemperature, 'temperature', units)}
                          {reading.inspector ? ` · ${reading.inspector}` : ''}
                        </span>
                      </a>
                    </li>
                  );
                })}
              </ul>
            )}
          </article>
        );
      })}
      <AddWire line={line} span={span} onAdded={onChanged} />
    </div>
  );
}
