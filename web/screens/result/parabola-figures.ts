// Which parabola figures to show beside a reading's exact result: the textbook hand calculation from the same
// reading (where the method has one) and the parabola's sag at the solved tension. Formulas live in core/parabola.
import {
  parabolicReturnWaveSag,
  parabolicSag,
  parabolicSightAngleSag,
  parabolicSightLineSag,
  parabolicTensionFromSag,
} from '../../../core/parabola';
import type { Measurement, SpanGeometry } from '../../../core/types';

export interface ParabolaFigures {
  /** Parabola's midspan sag at the exactly solved tension, m. */
  sagAtSolvedTension: number;
  /** Hand calculation from the reading itself, when the method has a textbook rule. */
  fromReading?: { rule: string; sag: number; horizontalTension: number };
}

function ruleSag(g: SpanGeometry, m: Measurement): { rule: string; sag: number } | undefined {
  switch (m.method) {
    case 'midspan-sag':
      return { rule: 'H = w·S²/(8D)', sag: m.sag };
    case 'sight-line':
      return { rule: 'D = ((√a + √b)/2)²', sag: parabolicSightLineSag(m.nearDrop, m.farDrop) };
    case 'sight-angle':
      return {
        rule: 'D = ((√a + √b)/2)², b = a + h − S·tan θ',
        sag: parabolicSightAngleSag(g.span, g.rise, m.nearDrop, m.angle),
      };
    case 'return-wave':
      return { rule: 'D = g·(T/N)²/32', sag: parabolicReturnWaveSag(m.seconds / m.returns) };
    case 'offset-sag':
    case 'surveyed-points':
      return undefined;
  }
}

export function parabolaFigures(
  g: SpanGeometry,
  weight: number,
  horizontalTension: number,
  m: Measurement,
): ParabolaFigures {
  const figures: ParabolaFigures = { sagAtSolvedTension: parabolicSag(g.span, weight, horizontalTension) };
  const rule = ruleSag(g, m);
  if (rule && Number.isFinite(rule.sag) && rule.sag > 0) {
    figures.fromReading = { ...rule, horizontalTension: parabolicTensionFromSag(g.span, weight, rule.sag) };
  }
  return figures;
}
