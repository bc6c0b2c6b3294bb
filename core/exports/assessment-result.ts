/**
 * Adapter from the assessment's result (core/assess) to the row figures of the exports, so the app can pass
 * `(context) => readingResultFromAssessment(assessReading(…))` as the exports' result function.
 */
import type { ReadingAssessment } from '../assess/types';
import type { ReadingResult } from './inspection-log';

/** The figures the inspection log, GeoJSON and report show, taken from one reading's assessment (SI). */
export function readingResultFromAssessment(assessment: ReadingAssessment): ReadingResult {
  return {
    horizontalTension: assessment.measured.horizontalTension,
    sag: assessment.measured.midspanSag,
    designSag: assessment.design.midspanSag,
    designHorizontalTension: assessment.design.horizontalTension,
    sagDeviation: assessment.verdict.sagDeviation,
    percentOfRatedStrength: assessment.percentOfRated,
    ...(assessment.clearance?.margin === undefined ? {} : { clearanceMargin: assessment.clearance.margin }),
    verdict: assessment.verdict.verdict,
    verdictReason: assessment.verdict.reason,
  };
}
