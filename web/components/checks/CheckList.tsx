// The checks of one judged reading: design against measured side by side, the sag deviation's 95 % band against
// the tolerance, tension in % of rated strength against the limits, H/w against the vibration guidance and the
// hot-day ground clearance. Every number through core/units formatQuantity in the line's units.
import type {
  CheckStatus,
  ClearanceResult,
  ReadingAssessment,
  TensionCheck,
  VibrationCheck,
} from '../../../core/assess/types';
import type { ComponentChildren } from 'preact';
import type { UnitSystem } from '../../../core/units';
import { UncertaintyBar } from './UncertaintyBar';
import { quantityText, signedText } from '../../judgement/verdict-words';
import './checks.css';

/** A check's status, or 'info' for a figure shown without a limit. */
type RowStatus = CheckStatus | 'info';

const STATUS_WORDS: Record<RowStatus, string> = {
  pass: 'Pass',
  marginal: 'Borderline',
  fail: 'Fail',
  'not-checked': 'Not checked',
  info: 'For information',
};

/** Status mark: shape and word, not colour alone. */
export function StatusMark({ status }: { status: RowStatus }) {
  const glyph = { pass: '✓', marginal: '!', fail: '✕', 'not-checked': '–', info: 'i' }[status];
  return (
    <span class={`status-mark status-mark--${status}`} data-status={status}>
      <span class="status-mark__glyph" aria-hidden="true">
        {glyph}
      </span>
      <span class="status-mark__word">{STATUS_WORDS[status]}</span>
    </span>
  );
}

function CheckRow({
  status,
  title,
  children,
  source,
}: {
  status: RowStatus;
  title: string;
  children: ComponentChildren;
  source?: string;
}) {
  return (
    <li class={`check-row check-row--${status}`}>
      <StatusMark status={status} />
      <div class="check-row__body">
        <strong class="check-row__title">{title}</strong>
        <div class="check-row__figures">{children}</div>
        {source && <p class="check-row__source">Source: {source}</p>}
      </div>
    </li>
  );
}

function percent(value: number, units: UnitSystem): string {
  return quantityText(value, 'percent', units);
}

/** A difference of two percentages: "+15.8 percentage points". */
function pointsText(value: number, units: UnitSystem): string {
  return `${signedText(value, 'percent', units).replace(/ %$/, '')} percentage points`;
}

function TensionRow({ check, units }: { check: TensionCheck; units: UnitSystem }) {
  if (check.status === 'not-checked') {
    return (
      <CheckRow status="not-checked" title={check.limit.label} source={check.limit.source}>
        Limit {percent(check.limit.percentOfRated, units)} of rated strength. Enter the loaded condition (ice
        and wind) of the design to check it.
      </CheckRow>
    );
  }
  return (
    <CheckRow status={check.status} title={check.limit.label} source={check.limit.source}>
      Projected to {quantityText(check.temperature, 'temperature', units)}: support tension{' '}
      {quantityText(check.supportTension, 'tension', units)} ={' '}
      <strong>{percent(check.percentOfRated, units)}</strong> of rated strength; limit{' '}
      {percent(check.limit.percentOfRated, units)}; margin {pointsText(check.margin, units)}.
    </CheckRow>
  );
}

function VibrationRow({ check, units }: { check: VibrationCheck; units: UnitSystem }) {
  return (
    <CheckRow
      status={check.status}
      title={`Vibration guidance: H/w, terrain category ${check.limit.terrainCategory}`}
      source={check.limit.source}
    >
      {check.limit.description}. At {quantityText(check.temperature, 'temperature', units)} (initial): H/w ={' '}
      <strong>{quantityText(check.catenaryParameter, 'length', units)}</strong>; limit{' '}
      {quantityText(check.limit.maxCatenaryParameter, 'length', units)} (from memory); margin{' '}
      {signedText(check.margin, 'length', units)}.
    </CheckRow>
  );
}

function ClearanceRow({ clearance, units }: { clearance: ClearanceResult | undefined; units: UnitSystem }) {
  if (!clearance) {
    return (
      <CheckRow status="not-checked" title="Ground clearance on the hottest design day">
        Enter the ground under the span (and the required clearance) to check it.
      </CheckRow>
    );
  }
  const band =
    clearance.band && Number.isFinite(clearance.band.low)
      ? ` (95 % band ${quantityText(clearance.band.low, 'length', units)} to ${quantityText(clearance.band.high, 'length', units)})`
      : '';
  return (
    <CheckRow
      status={clearance.status}
      title={`Ground clearance at ${quantityText(clearance.temperature, 'temperature', units)} (hottest design temperature)`}
    >
      Projected sag {quantityText(clearance.midspanSag, 'sag', units)} at midspan; lowest clearance{' '}
      <strong>{quantityText(clearance.minimumClearance, 'length', units)}</strong>
      {band}, {quantityText(clearance.minimumX, 'length', units)} from the near support.{' '}
      {clearance.requiredClearance !== undefined && clearance.margin !== undefined
        ? `Required ${quantityText(clearance.requiredClearance, 'length', units)}; margin ${signedText(clearance.margin, 'length', units)}.`
        : 'No required clearance entered for this span.'}
      <p class="check-row__caution">⚠ {clearance.caution}</p>
    </CheckRow>
  );
}

/** Design against measured, side by side, at the reading's conductor temperature. */
export function DesignVersusMeasured({
  assessment,
  units,
}: {
  assessment: ReadingAssessment;
  units: UnitSystem;
}) {
  const d = assessment.design;
  const m = assessment.measured;
  const rows: { label: string; design: number; measured: number; kind: 'tension' | 'sag' }[] = [
    {
      label: 'Horizontal tension H',
      design: d.horizontalTension,
      measured: m.horizontalTension,
      kind: 'tension',
    },
    { label: 'Midspan sag', design: d.midspanSag, measured: m.midspanSag, kind: 'sag' },
    { label: 'Maximum sag', design: d.maxSag, measured: m.maxSag, kind: 'sag' },
  ];
  return (
    <div class="versus">
      <p class="versus__caption">
        At {quantityText(assessment.temperature, 'temperature', units)} ({d.state}, ruling span{' '}
        {quantityText(d.rulingSpan, 'length', units)}
        {d.rulingSpanOverridden ? ', entered' : ''})
      </p>
      <div class="versus__scroll">
        <table class="versus__table">
          <thead>
            <tr>
              <th scope="col">Figure</th>
              <th scope="col">Design</th>
              <th scope="col">Measured</th>
              <th scope="col">
                <abbr title="Measured minus design">Diff.</abbr>
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((row) => (
              <tr key={row.label}>
                <th scope="row">{row.label}</th>
                <td data-label="Design">{quantityText(row.design, row.kind, units)}</td>
                <td data-label="Measured">{quantityText(row.measured, row.kind, units)}</td>
                <td data-label="Difference">{signedText(row.measured - row.design, row.kind, units)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p class="versus__note">
        Measured H carried to {quantityText(assessment.atCommonTemperature.temperature, 'temperature', units)}
        : {quantityText(assessment.atCommonTemperature.horizontalTension, 'tension', units)} (for comparing
        spans and readings).
      </p>
      {d.notes.length > 0 && (
        <ul class="versus__notes">
          {d.notes.map((note) => (
            <li key={note}>{note}</li>
          ))}
        </ul>
      )}
    </div>
  );
}

export interface CheckListProps {
  assessment: ReadingAssessment;
  units: UnitSystem;
}

/** All checks of one reading, each with pass / borderline / fail / not checked, its margin and its source. */
export function CheckList({ assessment, units }: CheckListProps) {
  const u = assessment.uncertainty;
  return (
    <section class="checks" aria-label="Checks">
      <h2>Design and measured</h2>
      <DesignVersusMeasured assessment={assessment} units={units} />
      <h2>Sag against the tolerance</h2>
      <UncertaintyBar verdict={assessment.verdict} units={units} />
      {u.available && u.contributions.length > 0 && (
        <p class="checks__contributions">
          Largest sources of uncertainty:{' '}
          {u.contributions
            .slice(0, 3)
            .map((part) => `${part.input} (±${quantityText(part.sigma, 'sag', units)})`)
            .join(', ')}
          .
        </p>
      )}
      <h2>Checks</h2>
      <ul class="check-list">
        <CheckRow status="info" title="Tension at the measured state">
          Highest support tension <strong>{percent(assessment.percentOfRated, units)}</strong> of rated
          strength at {quantityText(assessment.temperature, 'temperature', units)}; H{' '}
          {quantityText(u.horizontalTension.value, 'tension', units)}
          {Number.isFinite(u.horizontalTension.low)
            ? ` (95 % band ${quantityText(u.horizontalTension.low, 'tension', units)} to ${quantityText(u.horizontalTension.high, 'tension', units)})`
            : ''}
          . The limits apply to the projected states below.
        </CheckRow>
        {assessment.tensionChecks.map((check) => (
          <TensionRow key={check.limit.id} check={check} units={units} />
        ))}
        <VibrationRow check={assessment.vibration} units={units} />
        <ClearanceRow clearance={assessment.clearance} units={units} />
      </ul>
      <p class="checks__caution">
        Limits and tolerances are defaults with their sources named; the local code, the owner's standards and
        licensed engineering practice govern.
      </p>
    </section>
  );
}
