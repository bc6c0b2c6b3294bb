// Glue between stored records and the core solver: which geometry and weight a reading solves with, and the
// solved result or the solver's reason for refusing. The physics is all in core/.
import { lowPointX, wireElevation } from '../../core/catenary';
import { SpanInputError } from '../../core/errors';
import type { RecordSet } from '../../core/records/kinds';
import type { ReadingRecord } from '../../core/records/reading';
import type { SectionRecord } from '../../core/records/section';
import type { SpanRecord } from '../../core/records/span';
import type { WireRecord } from '../../core/records/wire';
import { solveSpan } from '../../core/solve';
import type { Measurement, SpanGeometry, SpanSolution } from '../../core/types';

/** Span and rise of one wire: the span's attachment elevations plus the wire's own offsets. */
export function wireGeometry(span: SpanRecord, wire: WireRecord | undefined): SpanGeometry {
  const near = span.nearAttachmentElevation + (wire?.nearOffset ?? 0);
  const far = span.farAttachmentElevation + (wire?.farOffset ?? 0);
  return { span: span.length, rise: far - near };
}

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
  return solveMeasurement(wireGeometry(span, wire), section.conductor.weight, reading.measurement);
}

/** The most recent reading of a wire (by time taken), if any. */
export function latestReading(records: RecordSet, wireId: string): ReadingRecord | undefined {
  return records.reading
    .filter((reading) => reading.wireId === wireId)
    .sort((a, b) => b.takenAt.localeCompare(a.takenAt))[0];
}

/** Ground elevation under the span at x (straight between the known points), or undefined when not known. */
export function groundAt(span: SpanRecord, x: number): number | undefined {
  const points: { x: number; elevation: number }[] = [];
  if (span.nearGroundElevation !== undefined) points.push({ x: 0, elevation: span.nearGroundElevation });
  for (const point of span.groundPoints ?? []) points.push(point);
  if (span.farGroundElevation !== undefined)
    points.push({ x: span.length, elevation: span.farGroundElevation });
  if (points.length === 0) return undefined;
  points.sort((a, b) => a.x - b.x);
  const first = points[0]!;
  const last = points[points.length - 1]!;
  if (x <= first.x) return first.elevation;
  if (x >= last.x) return last.elevation;
  for (let index = 1; index < points.length; index += 1) {
    const right = points[index]!;
    const left = points[index - 1]!;
    if (x <= right.x) {
      const share = right.x === left.x ? 0 : (x - left.x) / (right.x - left.x);
      return left.elevation + share * (right.elevation - left.elevation);
    }
  }
  return last.elevation;
}

/** Sample count for the clearance search: 1/400 of the span is finer than any ground survey. */
const CLEARANCE_SAMPLES = 400;

/**
 * Smallest vertical distance from the wire down to the ground line, m, and where it occurs; undefined when the
 * ground is not known. Samples the exact catenary from core.
 */
export function minimumClearance(
  span: SpanRecord,
  wire: WireRecord | undefined,
  catenaryParameter: number,
): { clearance: number; x: number } | undefined {
  if (groundAt(span, 0) === undefined) return undefined;
  const geometry = wireGeometry(span, wire);
  const nearElevation = span.nearAttachmentElevation + (wire?.nearOffset ?? 0);
  const lowX = lowPointX(geometry.span, geometry.rise, catenaryParameter);
  let best: { clearance: number; x: number } | undefined;
  for (let index = 0; index <= CLEARANCE_SAMPLES; index += 1) {
    const x = (geometry.span * index) / CLEARANCE_SAMPLES;
    const ground = groundAt(span, x) ?? 0;
    const clearance = nearElevation + wireElevation(x, catenaryParameter, lowX) - ground;
    if (best === undefined || clearance < best.clearance) best = { clearance, x };
  }
  return best;
}
