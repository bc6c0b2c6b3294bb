import { spanAtTension } from './catenary';
import { SpanInputError } from './errors';
import { tensionFromMidspanSag } from './methods/midspan-sag';
import { tensionFromOffsetSag } from './methods/offset-sag';
import { tensionFromReturnWave } from './methods/return-wave';
import { tensionFromSightAngle } from './methods/sight-angle';
import { tensionFromSightLine } from './methods/sight-line';
import { tensionFromSurveyedPoints } from './methods/surveyed-points';
import type { Measurement, SpanGeometry, SpanSolution } from './types';

/**
 * Back-solves the horizontal tension behind one field reading on the exact catenary and returns the whole span
 * at that tension (spanAtTension), plus the RMS fit residual for surveyed points.
 * @param g span S > 0 m, rise h m (far minus near attachment elevation)
 * @param weight w > 0, N/m
 * @param m the reading, SI units (see Measurement); each method's file documents its relation and domain
 * Accuracy: relative error on H below 1e-9 for exact readings (certified sign change within 1e-10 for the
 * one-unknown methods; Levenberg–Marquardt to 1e-13 relative step for surveyed points).
 * Throws SpanInputError with a specific code for readings that admit no wire shape; 'unknown-method' for a
 * method id it does not know (a record from a newer app version, say).
 */
export function solveSpan(g: SpanGeometry, weight: number, m: Measurement): SpanSolution {
  switch (m.method) {
    case 'midspan-sag':
      return spanAtTension(g, weight, tensionFromMidspanSag(g, weight, m));
    case 'offset-sag':
      return spanAtTension(g, weight, tensionFromOffsetSag(g, weight, m));
    case 'sight-line':
      return spanAtTension(g, weight, tensionFromSightLine(g, weight, m));
    case 'sight-angle':
      return spanAtTension(g, weight, tensionFromSightAngle(g, weight, m));
    case 'return-wave':
      return spanAtTension(g, weight, tensionFromReturnWave(g, weight, m));
    case 'surveyed-points': {
      const fit = tensionFromSurveyedPoints(g, weight, m);
      const solution = spanAtTension(g, weight, fit.horizontalTension);
      solution.fitResidual = fit.fitResidual;
      return solution;
    }
    default: {
      const unknown: unknown = (m as { method?: unknown }).method;
      throw new SpanInputError('unknown-method', `Unknown sag method "${String(unknown)}".`);
    }
  }
}
