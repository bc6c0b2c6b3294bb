// A line's records as the exports and the printed report take them: the records plus a result function that
// judges each reading with the same per-section settings the design screens use, so paper and screen agree.
import {
  type InspectionLogInput,
  type ReadingContext,
  type ReadingResult,
  readingResultFunction,
} from '../../core/exports';
import type { RecordSet } from '../../core/records/kinds';
import type { LineRecord } from '../../core/records/line';
import { assessSettingsFor } from '../judgement/assess-line';

/** The export input of `line`, from a record set that holds it (a line's records, or everything). */
export function lineLogInput(records: RecordSet, line: LineRecord): InspectionLogInput {
  const base: Omit<InspectionLogInput, 'resultFor'> = {
    line,
    sections: records.section.filter((section) => section.lineId === line.id),
    structures: records.structure.filter((structure) => structure.lineId === line.id),
    spans: records.span.filter((span) => span.lineId === line.id),
    wires: records.wire.filter((wire) => wire.lineId === line.id),
    readings: records.reading.filter((reading) => reading.lineId === line.id),
  };
  // One result function per section, built on first use (each caches its section's design state).
  const bySection = new Map<string, (context: ReadingContext) => ReadingResult>();
  const resultFor = (context: ReadingContext): ReadingResult => {
    const key = context.section?.id ?? '';
    let judge = bySection.get(key);
    if (!judge) {
      judge = readingResultFunction(base, context.section ? assessSettingsFor(context.section) : {});
      bySection.set(key, judge);
    }
    return judge(context);
  };
  return { ...base, resultFor };
}

/** The export input of every line in `records` (a whole-database export), in name order. */
export function allLinesLogInputs(records: RecordSet): InspectionLogInput[] {
  return records.line
    .filter((line) => !line.deleted)
    .sort((a, b) => a.name.localeCompare(b.name))
    .map((line) => lineLogInput(records, line));
}
