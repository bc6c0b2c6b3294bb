import { SpanInputError } from './errors';

/**
 * Ruling span of a tension section, m: RS = √(Σ S³ / Σ S), the single level span whose tension changes with
 * temperature and load as the section's does (spans of one section share a horizontal tension between dead-ends).
 * @param spans horizontal span lengths of the section, m, each finite and > 0; at least one
 * Source: standard line-design practice (e.g. Douglass & Thrash, "Sag and Tension of Conductor", Electric Power
 * Engineering Handbook, "ruling span"). Closed form, no iteration.
 */
export function rulingSpan(spans: number[]): number {
  if (spans.length === 0) {
    throw new SpanInputError(
      'spans-empty',
      'A tension section needs at least one span to compute its ruling span.',
    );
  }
  let sumCubes = 0;
  let sum = 0;
  for (const span of spans) {
    if (!Number.isFinite(span) || span <= 0) {
      throw new SpanInputError('span-not-positive', 'Every span length must be a number greater than zero.');
    }
    sumCubes += span * span * span;
    sum += span;
  }
  return Math.sqrt(sumCubes / sum);
}

/**
 * Sag of one span of a tension section scaled from the ruling-span sag, m: D = D_RS·(S/RS)².
 * Holds because every span of the section shares the ruling span's horizontal tension and, for moderate sag,
 * sag is proportional to S² at a given tension (SPEC §5; parabolic scaling, as in design practice).
 * @param rulingSag sag of the ruling span, m, finite and ≥ 0
 * @param rulingSpanLength ruling span, m, > 0
 * @param span the span whose sag is wanted, m, > 0
 */
export function sagFromRulingSpan(rulingSag: number, rulingSpanLength: number, span: number): number {
  if (!Number.isFinite(rulingSpanLength) || rulingSpanLength <= 0 || !Number.isFinite(span) || span <= 0) {
    throw new SpanInputError('span-not-positive', 'Span and ruling span must be numbers greater than zero.');
  }
  if (!Number.isFinite(rulingSag) || rulingSag < 0) {
    throw new SpanInputError('sag-not-positive', 'The ruling-span sag must be a number of zero or more.');
  }
  const ratio = span / rulingSpanLength;
  return rulingSag * ratio * ratio;
}
