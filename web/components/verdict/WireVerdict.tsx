// Drop-in verdicts for the app's screens: give it the loaded records and an id, it judges the line (memoised per
// load) and shows the badge, optionally with the reason.
import type { RecordSet } from '../../../core/records/kinds';
import { judgeLine } from '../../judgement/assess-line';
import { VerdictBadge, VerdictReason } from './VerdictBadge';

/** Verdict badge of one wire position (its readings combined); "not read yet" when it has none. */
export function WireVerdict({
  records,
  wireId,
  withReason = false,
}: {
  records: RecordSet;
  wireId: string;
  withReason?: boolean;
}) {
  const wire = judgeLine(records).wires.get(wireId);
  const verdict = wire?.verdict ?? 'no-reading';
  const units = records.line[0]?.unitSystem ?? 'metric';
  if (!withReason) return <VerdictBadge verdict={verdict} />;
  const combined = wire?.combined;
  return (
    <div class="wire-verdict">
      <VerdictBadge verdict={verdict} />
      <VerdictReason
        verdict={verdict}
        units={units}
        {...(combined?.ok ? { result: combined.value.verdict } : {})}
        {...(combined && !combined.ok && verdict === 'cannot-solve' ? { message: combined.message } : {})}
      />
    </div>
  );
}

/** Verdict badge of a span: the worst of its wires. */
export function SpanVerdict({ records, spanId }: { records: RecordSet; spanId: string }) {
  return <VerdictBadge verdict={judgeLine(records).spans.get(spanId) ?? 'no-reading'} />;
}
