// Everything the result screen shows about a reading against its design: the verdict with its reason, the wire's
// combined verdict when it has several readings, the profile with the design and hot-day wires and the clearance
// line, and the checks. Drop-in: give it the loaded records and the reading id.
import type { RecordSet } from '../../../core/records/kinds';
import { href } from '../../app/router';
import { ProfileBoundary, SpanProfile, type ProfileMark } from '../profile';
import { judgeLine } from '../../judgement/assess-line';
import { profileCurvesFor } from '../../judgement/profile-curves';
import { VerdictPanel } from '../verdict/VerdictBadge';
import { CheckList } from './CheckList';

export function ReadingJudgement({
  records,
  readingId,
  marks,
  showProfile = true,
}: {
  records: RecordSet;
  readingId: string;
  /** Reading marks to draw on the profile (the result screen's own). */
  marks?: ProfileMark[];
  showProfile?: boolean;
}) {
  const line = records.line[0];
  const judgement = judgeLine(records);
  const judged = judgement.readings.get(readingId);
  if (!line || !judged) return null;
  const units = line.unitSystem;
  const wire = judgement.wires.get(judged.reading.wireId);
  const result = judged.result;
  if (!result.ok) {
    const noDesign = result.code === 'no-design';
    return (
      <div class="reading-judgement">
        <VerdictPanel
          verdict={noDesign ? 'no-design' : 'cannot-solve'}
          units={units}
          message={result.message}
        />
        {noDesign && wire && (
          <p>
            <a href={href('line', line.id, 'section', wire.sectionId)}>
              Enter the design basis of the section
            </a>
          </p>
        )}
      </div>
    );
  }
  const assessment = result.value;
  const combined = wire?.combined.ok ? wire.combined.value : undefined;
  const others = (combined?.readings.length ?? 1) > 1;
  return (
    <div class="reading-judgement">
      <VerdictPanel
        verdict={assessment.verdict.verdict}
        result={assessment.verdict}
        designSag={assessment.design.midspanSag}
        units={units}
      />
      {others && combined && wire && (
        <div class="reading-judgement__wire">
          <h3>This wire, {combined.readings.length} readings combined</h3>
          <VerdictPanel verdict={wire.verdict} result={combined.verdict} units={units} size="normal" />
          {wire.disagreeing.some((item) => item.readingId === readingId) && (
            <p class="error-text">
              This reading disagrees with the other readings of the wire beyond their uncertainty: check it or
              measure again.
            </p>
          )}
        </div>
      )}
      {showProfile && judged.input && (
        <div class="panel profile-panel">
          <ProfileBoundary>
            <SpanProfile
              {...profileCurvesFor(assessment, judged.input, units)}
              {...(marks ? { readings: marks } : {})}
              title={`Measured, design and hot-day wire ${wire?.wire.label ?? ''}`}
            />
          </ProfileBoundary>
        </div>
      )}
      <CheckList assessment={assessment} units={units} />
    </div>
  );
}
