// A tension section at a glance: how many wires stand at each verdict, the worst first with their reasons, the
// spread of horizontal tension between spans (outliers pointed out) and readings that disagree with each other.
import type { SpanRecord } from '../../../core/records/span';
import type { UnitSystem } from '../../../core/units';
import type { SectionJudgement, ShownVerdict, WireJudgement } from '../../judgement/assess-line';
import { VerdictBadge, VerdictReason } from '../../components/verdict/VerdictBadge';
import { quantityText } from '../../judgement/verdict-words';
import './section-summary.css';

/** Order the counts are listed in: what needs action first. */
const COUNT_ORDER: readonly ShownVerdict[] = [
  'too-slack',
  'too-tight',
  'recheck',
  'cannot-solve',
  'within',
  'no-reading',
];

export interface SectionSummaryProps {
  judgement: SectionJudgement;
  unitSystem: UnitSystem;
  /** Shown name of a span, e.g. "Span 3 → 4". */
  spanName: (span: SpanRecord) => string;
  /** Link to a wire's span (optional). */
  wireHref?: (wire: WireJudgement) => string;
  /** Link to a reading's result (optional). */
  readingHref?: (readingId: string) => string;
  /** Shown time of a reading (optional; the reading's ISO time when absent). */
  readingTime?: (iso: string) => string;
}

function WireTitle({ wire, props }: { wire: WireJudgement; props: SectionSummaryProps }) {
  const text = `${props.spanName(wire.span)}, wire ${wire.wire.label}`;
  const link = props.wireHref?.(wire);
  return link ? <a href={link}>{text}</a> : <span>{text}</span>;
}

function WireItem({ wire, props }: { wire: WireJudgement; props: SectionSummaryProps }) {
  const combined = wire.combined;
  return (
    <li class={`summary-wire summary-wire--${wire.verdict}`} data-wire={wire.wire.id}>
      <div class="summary-wire__head">
        <VerdictBadge verdict={wire.verdict} />
        <strong class="summary-wire__name">
          <WireTitle wire={wire} props={props} />
        </strong>
        {combined.ok && (
          <span class="summary-wire__count">
            {combined.value.readings.length} reading{combined.value.readings.length === 1 ? '' : 's'}
          </span>
        )}
      </div>
      <VerdictReason
        verdict={wire.verdict}
        units={props.unitSystem}
        {...(combined.ok ? { result: combined.value.verdict } : {})}
        {...(!combined.ok && wire.verdict === 'cannot-solve' ? { message: combined.message } : {})}
      />
    </li>
  );
}

export function SectionSummary(props: SectionSummaryProps) {
  const { judgement, unitSystem: units } = props;
  const wires = judgement.wires;
  if (!judgement.design.ok) {
    return (
      <section class="section-summary" aria-label={`Summary of section ${judgement.section.name}`}>
        <div class="section-summary__head">
          <VerdictBadge verdict="no-design" size="large" />
          <p>{judgement.design.message} Enter the design basis to judge this section's wires.</p>
        </div>
      </section>
    );
  }
  const counts = new Map<ShownVerdict, number>();
  for (const wire of wires) counts.set(wire.verdict, (counts.get(wire.verdict) ?? 0) + 1);
  const byId = new Map(wires.map((wire) => [wire.wire.id, wire]));
  const judgedFirst = (judgement.summary?.worstFirst ?? [])
    .map((id) => byId.get(id))
    .filter((wire): wire is WireJudgement => wire !== undefined);
  const rest = wires.filter((wire) => !judgedFirst.includes(wire));
  const ordered = [
    ...judgedFirst.filter((wire) => wire.verdict !== 'within'),
    ...rest.filter((wire) => wire.verdict === 'cannot-solve'),
    ...judgedFirst.filter((wire) => wire.verdict === 'within'),
    ...rest.filter((wire) => wire.verdict !== 'cannot-solve'),
  ];
  // Wires that need someone to look (out of tolerance, undecided, unsolvable) stay in view; the rest fold away.
  const isSettled = (wire: WireJudgement): boolean =>
    wire.verdict === 'within' || wire.verdict === 'no-reading';
  const needsLook = ordered.filter((wire) => !isSettled(wire));
  const settled = ordered.filter(isSettled);
  const commonTemperature = wires
    .flatMap((wire) => (wire.combined.ok ? wire.combined.value.readings : []))
    .map((reading) => reading.atCommonTemperature.temperature)[0];
  const spanOfWire = (id: string): string => {
    const wire = byId.get(id);
    return wire ? `${props.spanName(wire.span)} (wire ${wire.wire.label})` : id;
  };
  const disagreeing = wires.filter((wire) => wire.disagreeing.length > 0);

  return (
    <section class="section-summary" aria-label={`Summary of section ${judgement.section.name}`}>
      <h2>Verdicts in this section</h2>
      <ul class="summary-counts" aria-label="Wires by verdict">
        {COUNT_ORDER.filter((verdict) => (counts.get(verdict) ?? 0) > 0).map((verdict) => (
          <li key={verdict} class="summary-counts__item" data-verdict={verdict}>
            <span class="summary-counts__number">{counts.get(verdict)}</span>
            <VerdictBadge verdict={verdict} />
          </li>
        ))}
        {wires.length === 0 && <li class="empty">No wire positions in this section yet.</li>}
      </ul>

      {needsLook.length > 0 && (
        <>
          <h3>Worst first</h3>
          <ol class="summary-wires">
            {needsLook.map((wire) => (
              <WireItem key={wire.wire.id} wire={wire} props={props} />
            ))}
          </ol>
        </>
      )}
      {settled.length > 0 && (
        <details class="summary-settled" open={needsLook.length === 0}>
          <summary>
            {settled.length} wire{settled.length === 1 ? '' : 's'} within tolerance or not read yet
          </summary>
          <ol class="summary-wires">
            {settled.map((wire) => (
              <WireItem key={wire.wire.id} wire={wire} props={props} />
            ))}
          </ol>
        </details>
      )}

      {judgement.summary && judgement.summary.spread.length > 0 && (
        <>
          <h3>
            Tension between spans
            {commonTemperature !== undefined
              ? ` (at ${quantityText(commonTemperature, 'temperature', units)})`
              : ''}
          </h3>
          <p class="muted small">
            Spans of one tension section share one horizontal tension; a span far from the others is worth a
            second look (its reading, its span length or its clamps).
          </p>
          <ul class="summary-spread">
            {judgement.summary.spread.map((spread) => (
              <li key={spread.group ?? 'all'} class="summary-spread__group">
                <strong>{spread.group !== undefined ? `Wire ${spread.group}` : 'All wires'}:</strong> median{' '}
                {quantityText(spread.median, 'tension', units)}, from{' '}
                {quantityText(spread.min, 'tension', units)} to {quantityText(spread.max, 'tension', units)}{' '}
                (spread {quantityText(100 * spread.relativeSpread, 'percent', units)}, {spread.count} span
                {spread.count === 1 ? '' : 's'}).
                {spread.outliers.length > 0 ? (
                  <ul class="summary-spread__outliers">
                    {spread.entries
                      .filter((entry) => entry.outlier)
                      .map((entry) => (
                        <li key={entry.id} data-outlier={entry.id}>
                          ⚑ {spanOfWire(entry.id)} stands out:{' '}
                          {quantityText(entry.horizontalTension, 'tension', units)},{' '}
                          {entry.horizontalTension > spread.median ? 'tighter' : 'slacker'} than the others
                          (modified z-score {entry.modifiedZ.toFixed(1)}; more than 3.5 is pointed out, after
                          Iglewicz & Hoaglin, from memory).
                        </li>
                      ))}
                  </ul>
                ) : spread.count < 3 ? (
                  <span class="muted"> Too few spans to point out outliers.</span>
                ) : (
                  <span class="muted"> No span stands out.</span>
                )}
              </li>
            ))}
          </ul>
        </>
      )}

      {disagreeing.length > 0 && (
        <>
          <h3>Readings that disagree</h3>
          <ul class="summary-disagree">
            {disagreeing.map((wire) =>
              wire.disagreeing.map((item) => {
                const reading = wire.readings.find((r) => r.reading.id === item.readingId)?.reading;
                const when = reading ? (props.readingTime?.(reading.takenAt) ?? reading.takenAt) : '';
                const link = props.readingHref?.(item.readingId);
                const label = `Reading of ${when}`;
                return (
                  <li key={item.readingId} data-disagreeing={item.readingId}>
                    ⚠ <WireTitle wire={wire} props={props} />: {link ? <a href={link}>{label}</a> : label}{' '}
                    differs from the others by {Math.abs(item.sigmas).toFixed(1)} standard deviations (more
                    than 2 is pointed out). Check it, or measure again.
                  </li>
                );
              }),
            )}
          </ul>
        </>
      )}
    </section>
  );
}
