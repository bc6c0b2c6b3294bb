// The section summary wired to the app: judges the loaded line (memoised) and names spans by their structures.
// Wire titles are not links here: the span cards under the summary already are (one link per span).
import type { RecordSet } from '../../../core/records/kinds';
import type { SpanRecord } from '../../../core/records/span';
import { showTime } from '../../app/format';
import { href } from '../../app/router';
import { judgeLine } from '../../judgement/assess-line';
import { SectionSummary } from './SectionSummary';

/** "Span 3 → 4" from the structures' labels. */
export function spanNameIn(records: RecordSet): (span: SpanRecord) => string {
  const label = (id: string): string => records.structure.find((item) => item.id === id)?.label ?? '?';
  return (span) => `Span ${label(span.nearStructureId)} → ${label(span.farStructureId)}`;
}

export function LineSectionSummary({ records, sectionId }: { records: RecordSet; sectionId: string }) {
  const line = records.line[0];
  const judgement = judgeLine(records).sections.find((item) => item.section.id === sectionId);
  if (!line || !judgement) return null;
  return (
    <SectionSummary
      judgement={judgement}
      unitSystem={line.unitSystem}
      spanName={spanNameIn(records)}
      readingHref={(readingId) => href('line', line.id, 'reading', readingId)}
      readingTime={showTime}
    />
  );
}
