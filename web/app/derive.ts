// Glue between stored records and the core solver: which geometry and weight a reading solves with, and the
// solved result or the solver's reason for refusing. The physics is all in core/.
import { minimumClearance as clearanceUnder } from '../../core/assess/clearance';
import { SpanInputError } from '../../core/errors';
import type { RecordSet } from '../../core/records/kinds';
import type { ReadingRecord } from '../../core/records/reading';
import type { SectionRecord } from '../../core/records/section';
import type { SpanRecord } from '../../core/records/span';
import type { WireRecord } from '../../core/records/wire';
import { clearanceSiteFor, wireGeometry } from '../../core/records/wire-site';
import { solveSpan } from '../../core/solve';
import type { Measurement, SpanGeometry, SpanSolution } from '../../core/types';

export type Solved =
  | { ok: true; solution: SpanSolution; geometry: SpanGeometry; weight: number }
  | { ok: false; code: string; message: string };

/** Solves a measurement on a span, turning any refusal into a message (never throws, never NaN). */
export function solveMeasurement(geometry: SpanGeometry, weight: number, measurement: Measurement): Solved {
  try {
    const solution = solveSpan(geometry, weight, measurement);
    if (!Number.isFinite(solution.horizontalTension)) {
      return { ok: false, code: 'input-not-finite', message: 'These figures do not give a tension.' };
    }
    return { ok: true, solution, geometry, weight };
  } catch (error) {
    if (error instanceof SpanInputError) return { ok: false, code: error.code, message: error.message };
    return { ok: false, code: 'unexpected', message: 'These figures could not be solved.' };
  }
}

/** Everything a reading needs from its line, found by id; undefined parts mean the record was removed. */
export interface ReadingContext {
  reading: ReadingRecord;
  span: SpanRecord | undefined;
  wire: WireRecord | undefined;
  section: SectionRecord | undefined;
}

export function readingContext(records: RecordSet, reading: ReadingRecord): ReadingContext {
  const span = records.span.find((item) => item.id === reading.spanId);
  return {
    reading,
    span,
    wire: records.wire.find((item) => item.id === reading.wireId),
    section: span && records.section.find((item) => item.id === span.sectionId),
  };
}

export function solveReading(context: ReadingContext): Solved {
  const { span, section, wire, reading } = context;
  if (!span) return { ok: false, code: 'missing', message: 'The span of this reading was removed.' };
  if (!section)
    return { ok: false, code: 'missing', message: 'The tension section of this span was removed.' };
  return solveMeasurement(wireGeometry(span, wire).geometry, section.conductor.weight, reading.measurement);
}

/** The most recent reading of a wire (by time taken), if any. */
export function latestReading(records: RecordSet, wireId: string): ReadingRecord | undefined {
  return records.reading
    .filter((reading) => reading.wireId === wireId)
    .sort((a, b) => b.takenAt.localeCompare(a.takenAt))[0];
}

/**
 * Smallest vertical distance from the wire down to the known ground under the span, m, and where it occurs;
 * undefined when no ground under the span is known. The search is core's (exact catenary).
 */
export function minimumClearance(
  span: SpanRecord,
  wire: WireRecord | undefined,
  catenaryParameter: number,
): { clearance: number; x: number } | undefined {
  const site = clearanceSiteFor(span, wire);
  if (!site) return undefined;
  const found = clearanceUnder(wireGeometry(span, wire).geometry, catenaryParameter, site);
  return Number.isFinite(found.clearance) ? { clearance: found.clearance, x: found.x } : undefined;
}
