// Result of one reading: the exact catenary's figures, the parabola's beside them for comparison, the clearance
// where the ground is known, the profile drawing, and what was read.
import { useState } from 'preact/hooks';
import type { RecordSet } from '../../../core/records/kinds';
import type { ReadingRecord } from '../../../core/records/reading';
import type { UnitSystem } from '../../../core/units';
import { useData, useLineRecords } from '../../app/context';
import { minimumClearance, readingContext, solveReading, type ReadingContext } from '../../app/derive';
import { show, showTime } from '../../app/format';
import { describePosition } from '../../app/geolocation';
import { href, navigate } from '../../app/router';
import { Badge } from '../../components/badge/Badge';
import { Button, LinkButton } from '../../components/button/Button';
import { Caution } from '../../components/caution/Caution';
import { Crumbs } from '../../components/crumbs/Crumbs';
import { ProfileBoundary, SpanProfile, type ProfileMark } from '../../components/profile';
import { ReadingJudgement } from '../../components/checks/ReadingJudgement';
import { readingIsJudged } from '../../judgement/assess-line';
import { methodTitle } from '../reading/methods';
import { ParabolaComparison } from './ParabolaComparison';
import './result.css';

function Figure({
  label,
  value,
  note,
  testId,
  valueSI,
  wide,
}: {
  label: string;
  value: string;
  note?: string;
  testId?: string;
  /** The unrounded SI value, kept on the element for exports and tests that compare with core. */
  valueSI?: number;
  /** Words rather than a number: give it the whole row. */
  wide?: boolean;
}) {
  return (
    <div class={wide ? 'figure figure--wide' : 'figure'}>
      <dt class="figure__label">{label}</dt>
      <dd class="figure__value" data-testid={testId} data-value-si={valueSI}>
        {value}
      </dd>
      {note && <dd class="figure__note">{note}</dd>}
    </div>
  );
}

/** Where the low point lies, in words: inside the span, or beyond one support (steep spans). */
function lowPointWords(lowX: number, span: number, units: UnitSystem): string {
  if (lowX < 0)
    return `beyond the near support, ${show(-lowX, 'length', units)} back from it: the wire climbs all the way`;
  if (lowX > span)
    return `beyond the far support, ${show(lowX - span, 'length', units)} past it: the wire falls all the way`;
  return `${show(lowX, 'length', units)} from the near support`;
}

function readingMarks(reading: ReadingRecord): ProfileMark[] {
  const m = reading.measurement;
  switch (m.method) {
    case 'midspan-sag':
      return [{ kind: 'sag-reading', x: Number.NaN, sag: m.sag, label: 'reading' }];
    case 'offset-sag':
      return [{ kind: 'sag-reading', x: m.x, sag: m.sag, label: 'reading' }];
    case 'sight-line':
      return [{ kind: 'sight-line', nearDrop: m.nearDrop, farDrop: m.farDrop }];
    case 'sight-angle':
      return [{ kind: 'sight-angle', nearDrop: m.nearDrop, angle: m.angle }];
    case 'surveyed-points':
      return m.points.map((point) => ({ kind: 'point' as const, x: point.x, z: point.z }));
    case 'return-wave':
      return [];
  }
}

function RawReading({ reading, units }: { reading: ReadingRecord; units: UnitSystem }) {
  const m = reading.measurement;
  const rows: [string, string][] = [];
  switch (m.method) {
    case 'midspan-sag':
      rows.push(['Sag at midspan', show(m.sag, 'sag', units)]);
      break;
    case 'offset-sag':
      rows.push(
        ['Distance from near structure', show(m.x, 'length', units)],
        ['Sag there', show(m.sag, 'sag', units)],
      );
      break;
    case 'sight-line':
      rows.push(
        ['Near target drop', show(m.nearDrop, 'length', units)],
        ['Far target drop', show(m.farDrop, 'length', units)],
      );
      break;
    case 'sight-angle':
      rows.push(
        ['Instrument drop', show(m.nearDrop, 'length', units)],
        ['Vertical angle', show(m.angle, 'angle', units)],
      );
      break;
    case 'return-wave':
      rows.push(['Returns', String(m.returns)], ['Time', show(m.seconds, 'time', units)]);
      if (reading.taps) rows.push(['Taps recorded', String(reading.taps.length)]);
      break;
    case 'surveyed-points':
      rows.push(['Points on the wire', String(m.points.length)]);
      break;
  }
  rows.push(['Conductor temperature', show(reading.conductorTemperature, 'temperature', units)]);
  if (reading.ambientTemperature !== undefined)
    rows.push(['Air temperature', show(reading.ambientTemperature, 'temperature', units)]);
  rows.push(['Taken', showTime(reading.takenAt)]);
  if (reading.inspector) rows.push(['Inspector', reading.inspector]);
  if (reading.location) rows.push(['Location', describePosition(reading.location)]);
  return (
    <dl class="raw">
      {rows.map(([label, value]) => (
        <div class="raw__row" key={label}>
          <dt>{label}</dt>
          <dd>{value}</dd>
        </div>
      ))}
      {reading.notes && (
        <div class="raw__row raw__row--notes">
          <dt>Notes</dt>
          <dd>{reading.notes}</dd>
        </div>
      )}
    </dl>
  );
}

function ResultBody({ records, context }: { records: RecordSet; context: ReadingContext }) {
  const line = records.line[0]!;
  const units = line.unitSystem;
  const { reading, span, wire, section } = context;
  const solved = solveReading(context);
  if (!solved.ok || !span) {
    return (
      <div class="panel">
        <Badge tone="bad">Cannot solve</Badge>
        <p>{solved.ok ? 'The span of this reading is missing.' : solved.message}</p>
        <RawReading reading={reading} units={units} />
      </div>
    );
  }
  const s = solved.solution;
  const rated = section?.conductor.ratedStrength;
  const highest = Math.max(s.nearSupportTension, s.farSupportTension);
  const clearance = minimumClearance(span, wire, s.catenaryParameter);
  const nearElevation = span.nearAttachmentElevation + (wire?.nearOffset ?? 0);
  const ground = [
    ...(span.nearGroundElevation !== undefined ? [{ x: 0, elevation: span.nearGroundElevation }] : []),
    ...(span.groundPoints ?? []),
    ...(span.farGroundElevation !== undefined
      ? [{ x: span.length, elevation: span.farGroundElevation }]
      : []),
  ];
  const marks = readingMarks(reading).map((mark) =>
    mark.kind === 'sag-reading' && Number.isNaN(mark.x) ? { ...mark, x: span.length / 2 } : mark,
  );
  return (
    <>
      <dl class="figures figures--main">
        <Figure
          label="Horizontal tension"
          value={show(s.horizontalTension, 'tension', units)}
          valueSI={s.horizontalTension}
          testId="result-tension"
          note={
            rated !== undefined
              ? `${show((100 * s.horizontalTension) / rated, 'percent', units)} of rated strength`
              : undefined
          }
        />
        <Figure
          label="Midspan sag"
          value={show(s.midspanSag, 'sag', units)}
          valueSI={s.midspanSag}
          testId="result-sag"
        />
        <Figure
          label="Maximum sag"
          value={show(s.maxSag, 'sag', units)}
          note={`${show(s.maxSagX, 'length', units)} from the near support`}
        />
        <Figure label="Catenary parameter H/w" value={show(s.catenaryParameter, 'length', units)} />
      </dl>
      <ReadingJudgement records={records} readingId={reading.id} marks={marks} />
      {/* A judged reading draws its profile with the design and hot-day wires inside the judgement. */}
      {!readingIsJudged(records, reading.id) && (
        <div class="panel profile-panel">
          <ProfileBoundary>
            <SpanProfile
              span={solved.geometry.span}
              rise={solved.geometry.rise}
              nearAttachmentElevation={nearElevation}
              curves={[
                {
                  label: `measured, ${show(reading.conductorTemperature, 'temperature', units)}`,
                  catenaryParameter: s.catenaryParameter,
                  style: 'measured',
                },
              ]}
              readings={marks}
              lowPointX={s.lowPointX}
              ground={ground.length > 0 ? ground : undefined}
              requiredClearance={span.requiredClearance}
              unitSystem={units}
              title={`Profile of wire ${wire?.label ?? ''}`}
            />
          </ProfileBoundary>
        </div>
      )}
      <dl class="figures">
        <Figure label="Low point" wide value={lowPointWords(s.lowPointX, span.length, units)} />
        <Figure label="Near support tension" value={show(s.nearSupportTension, 'tension', units)} />
        <Figure label="Far support tension" value={show(s.farSupportTension, 'tension', units)} />
        {rated !== undefined && (
          <Figure
            label="Highest tension, % of rated strength"
            value={show((100 * highest) / rated, 'percent', units)}
            note={`rated strength ${show(rated, 'tension', units)} (${section?.conductor.name ?? ''})`}
          />
        )}
        <Figure label="Wire length" value={show(s.arcLength, 'length', units)} />
        <Figure label="One return-wave period" value={show(s.returnTime, 'time', units)} />
        {s.fitResidual !== undefined && (
          <Figure
            label="Fit residual (RMS)"
            value={show(s.fitResidual, 'sag', units, 3)}
            note="How far the surveyed points lie from the fitted wire."
          />
        )}
        {clearance ? (
          <Figure
            wide
            label="Lowest ground clearance"
            value={show(clearance.clearance, 'length', units)}
            note={`${show(clearance.x, 'length', units)} from the near support${
              span.requiredClearance !== undefined
                ? clearance.clearance >= span.requiredClearance
                  ? `; required ${show(span.requiredClearance, 'length', units)}: met at this temperature`
                  : `; required ${show(span.requiredClearance, 'length', units)}: NOT met at this temperature`
                : ''
            }`}
          />
        ) : (
          <Figure
            wide
            label="Ground clearance"
            value="—"
            note="Enter ground elevations on the span to see it."
          />
        )}
      </dl>
      <ParabolaComparison
        geometry={solved.geometry}
        weight={solved.weight}
        solution={s}
        measurement={reading.measurement}
        units={units}
      />
      <h2>What was read</h2>
      <div class="panel">
        <p>
          <strong>{methodTitle(reading.measurement.method)}</strong> · wire {wire?.label ?? '?'}
        </p>
        <RawReading reading={reading} units={units} />
      </div>
    </>
  );
}

export function ResultScreen({ lineId, readingId }: { lineId: string; readingId: string }) {
  const data = useData();
  const [loaded] = useLineRecords(lineId);
  const [confirmRemove, setConfirmRemove] = useState(false);
  if (loaded.state === 'loading') return <p class="muted">Solving…</p>;
  if (loaded.state === 'failed')
    return <p class="error-text">This line could not be read: {loaded.message}</p>;
  const records = loaded.value;
  const line = records?.line[0];
  const reading = records?.reading.find((item) => item.id === readingId);
  if (!records || !line || !reading) {
    return (
      <p class="empty">
        This reading is not on this phone. <a href={href('line', lineId)}>Back to the line</a>
      </p>
    );
  }
  const context = readingContext(records, reading);
  const label = (id: string | undefined): string =>
    records.structure.find((item) => item.id === id)?.label ?? '?';
  const spanName = `Span ${label(context.span?.nearStructureId)} → ${label(context.span?.farStructureId)}`;
  return (
    <section>
      <Crumbs
        items={[
          { label: 'Lines', to: href() },
          { label: line.name, to: href('line', line.id) },
          ...(context.span ? [{ label: spanName, to: href('line', line.id, 'span', context.span.id) }] : []),
        ]}
      />
      <h1>
        Result: {spanName}, wire {context.wire?.label ?? '?'}
      </h1>
      <p class="muted">
        {methodTitle(reading.measurement.method)} · {showTime(reading.takenAt)} ·{' '}
        {context.section?.conductor.name ?? ''}
      </p>
      <ResultBody records={records} context={context} />
      <Caution title="Estimate for inspection">
        <p>
          These figures come from the readings entered and the conductor data of the section. They are not a
          substitute for engineering review; the local code, the owner's standards and licensed practice
          govern. Readings taken in wind are not valid.
        </p>
      </Caution>
      <div class="btn-row no-print">
        {context.span && (
          <LinkButton
            look="primary"
            href={`${href('line', line.id, 'span', context.span.id, 'reading')}?wire=${reading.wireId}`}
          >
            Another reading of this wire
          </LinkButton>
        )}
        {confirmRemove ? (
          <Button
            look="danger"
            onClick={() =>
              void data
                .remove('reading', reading.id)
                .then(() =>
                  navigate(
                    context.span ? href('line', line.id, 'span', context.span.id) : href('line', line.id),
                  ),
                )
            }
          >
            Yes, remove this reading
          </Button>
        ) : (
          <Button look="danger" onClick={() => setConfirmRemove(true)}>
            Remove reading
          </Button>
        )}
      </div>
    </section>
  );
}
