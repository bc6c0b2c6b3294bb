/**
 * One verdict and one set of figures per span, for the GeoJSON properties and the report's summary: each wire
 * counts with its latest reading, and the span shows its worst wire.
 */
import { type GeoJsonFeatureCollection, type SpanGeoFigures, buildGeoJson } from './geojson';
import {
  type InspectionLogInput,
  type ReadingContext,
  type ReadingResult,
  inspectionLogContexts,
} from './inspection-log';

/** Worse verdicts rank higher: a tight wire risks the structure, a slack one the clearance, a recheck is open. */
export const VERDICT_SEVERITY: Readonly<Record<string, number>> = {
  'too-tight': 4,
  'too-slack': 3,
  recheck: 2,
  within: 1,
};

export interface AssessedReading {
  context: ReadingContext;
  result: ReadingResult | undefined;
}

/** The latest reading of each wire (by takenAt), in log order. */
export function latestReadingPerWire(contexts: readonly ReadingContext[]): ReadingContext[] {
  const latest = new Map<string, ReadingContext>();
  for (const context of contexts) {
    const current = latest.get(context.wire.id);
    if (!current || context.reading.takenAt > current.reading.takenAt) latest.set(context.wire.id, context);
  }
  return contexts.filter((context) => latest.get(context.wire.id) === context);
}

function severity(entry: AssessedReading): number {
  const verdict = entry.result?.verdict;
  return verdict === undefined ? 0 : (VERDICT_SEVERITY[verdict] ?? 0);
}

/** The governing entry: worst verdict, then the largest sag deviation either way. */
export function governingReading(entries: readonly AssessedReading[]): AssessedReading | undefined {
  let best: AssessedReading | undefined;
  for (const entry of entries) {
    if (!best) {
      best = entry;
      continue;
    }
    const bySeverity = severity(entry) - severity(best);
    const deviation = Math.abs(entry.result?.sagDeviation ?? 0) - Math.abs(best.result?.sagDeviation ?? 0);
    if (bySeverity > 0 || (bySeverity === 0 && deviation > 0)) best = entry;
  }
  return best;
}

/** The governing latest reading of each span, keyed by span id (spans without readings are absent). */
export function governingReadingBySpan(input: InspectionLogInput): Map<string, AssessedReading> {
  const grouped = new Map<string, AssessedReading[]>();
  for (const context of latestReadingPerWire(inspectionLogContexts(input))) {
    const entry = { context, result: input.resultFor?.(context) };
    const list = grouped.get(context.span.id) ?? [];
    list.push(entry);
    grouped.set(context.span.id, list);
  }
  const governing = new Map<string, AssessedReading>();
  for (const [spanId, entries] of grouped) {
    const entry = governingReading(entries);
    if (entry) governing.set(spanId, entry);
  }
  return governing;
}

/** GeoJSON figures of a span from its governing reading. */
export function spanGeoFigures(entry: AssessedReading | undefined): SpanGeoFigures | undefined {
  const result = entry?.result;
  if (!result) return undefined;
  const reason = result.error ?? result.verdictReason;
  return {
    ...(result.verdict === undefined ? {} : { verdict: result.verdict }),
    ...(reason === undefined ? {} : { verdictReason: reason }),
    ...(result.horizontalTension === undefined ? {} : { horizontalTension: result.horizontalTension }),
    ...(result.sag === undefined ? {} : { sag: result.sag }),
    ...(result.designSag === undefined ? {} : { designSag: result.designSag }),
    ...(result.sagDeviation === undefined ? {} : { sagDeviation: result.sagDeviation }),
  };
}

/** GeoJSON of a line with each span's governing verdict and figures (see buildGeoJson for the layout). */
export function lineGeoJson(input: InspectionLogInput): GeoJsonFeatureCollection {
  const governing = governingReadingBySpan(input);
  return buildGeoJson({
    structures: input.structures.filter((structure) => structure.lineId === input.line.id),
    spans: input.spans.filter((span) => span.lineId === input.line.id),
    figuresForSpan: (span) => spanGeoFigures(governing.get(span.id)),
  });
}
