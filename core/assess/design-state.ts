/**
 * The design at the conductor temperature of a reading: the section's horizontal tension (shared by every span,
 * the ruling-span concept) and each span's design sag.
 */
import { spanAtTension } from '../catenary';
import { SpanInputError } from '../errors';
import { sagFromRulingSpan } from '../ruling-span';
import type { SpanGeometry } from '../types';
import { tableTensionAt } from './design-table';
import { changeWireState, creepOffsetOf, sectionRulingSpan, stateGeometry } from './state-model';
import type { DesignAtTemperature, SectionDesignInput, TensionDesignInput, WireState } from './types';

/**
 * Design horizontal tension at the basis' reference condition, N: the stated H, or percentOfRated/100 × rated
 * strength. Throws 'design-basis-invalid' unless exactly one of the two is a positive number.
 */
export function referenceDesignTension(basis: TensionDesignInput, ratedStrength: number): number {
  const hasTension = basis.horizontalTension !== undefined;
  const hasPercent = basis.percentOfRated !== undefined;
  if (hasTension === hasPercent) {
    throw new SpanInputError(
      'design-basis-invalid',
      'Give the design tension either in newtons or as a percentage of rated strength (one of the two).',
    );
  }
  const tension = basis.horizontalTension ?? ((basis.percentOfRated ?? Number.NaN) / 100) * ratedStrength;
  if (!Number.isFinite(tension) || tension <= 0 || !Number.isFinite(basis.referenceTemperature)) {
    throw new SpanInputError(
      'design-basis-invalid',
      'The design tension and its reference temperature must be numbers (tension greater than zero).',
    );
  }
  return tension;
}

/**
 * The section's design horizontal tension at a conductor temperature and condition, N (the same in every span).
 * @param section conductor, design basis, span lengths (or ruling-span override)
 * @param spanGeometry the span being judged (used only for a one-span section; see stateGeometry)
 * @param temperature conductor temperature, °C
 * @param state condition compared: initial (as strung) or final (after creep)
 * Method: tension basis: exact change of state on the level ruling span from the reference condition (knee-point
 * model for steel-cored conductors), creep as an equivalent temperature offset; table basis: tableTensionAt.
 */
export function designTensionAt(
  section: SectionDesignInput,
  spanGeometry: SpanGeometry,
  temperature: number,
  state: WireState,
): { horizontalTension: number; extrapolated: boolean } {
  if (!Number.isFinite(temperature)) {
    throw new SpanInputError('state-invalid', 'Conductor temperature must be a number.');
  }
  const geometry = stateGeometry(section, spanGeometry);
  const creepOffset = creepOffsetOf(section.basis);
  const basis = section.basis;
  if (basis.kind === 'table') {
    const { horizontalTension, extrapolated } = tableTensionAt(
      basis,
      geometry,
      section.conductor,
      temperature,
      state,
      creepOffset,
    );
    return { horizontalTension, extrapolated };
  }
  const reference = referenceDesignTension(basis, section.conductor.ratedStrength);
  const horizontalTension = changeWireState(
    geometry,
    section.conductor,
    { horizontalTension: reference, temperature: basis.referenceTemperature, state: basis.state },
    { temperature, state },
    creepOffset,
  );
  return { horizontalTension, extrapolated: false };
}

/**
 * Design tension and this span's design sag at a conductor temperature.
 * @param section the tension section
 * @param spanGeometry this wire's span S > 0 m and rise h m
 * @param temperature conductor temperature, °C
 * @param state condition compared (initial or final)
 * The span's design sag is the exact catenary of its own S and h at the section's design H: all spans between
 * dead-ends share H, and on inclined or long spans the exact curve at that H is what the wire does. The textbook
 * scaling D_RS·(S/RS)² (parabolic, level) is returned as scaledSag for comparison only.
 */
export function designAtTemperature(
  section: SectionDesignInput,
  spanGeometry: SpanGeometry,
  temperature: number,
  state: WireState,
): DesignAtTemperature {
  const { rulingSpan, overridden } = sectionRulingSpan(section);
  const { horizontalTension, extrapolated } = designTensionAt(section, spanGeometry, temperature, state);
  const weight = section.conductor.weight;
  const rulingSpanSag = spanAtTension({ span: rulingSpan, rise: 0 }, weight, horizontalTension).midspanSag;
  const own = spanAtTension(spanGeometry, weight, horizontalTension);
  const notes: string[] = [];
  if (extrapolated) {
    notes.push(
      `The design table does not cover ${temperature.toFixed(1)} °C; the design was carried from the nearest ` +
        'row by change of state.',
    );
  }
  if (
    section.basis.kind === 'table' &&
    section.basis.creepOffset === undefined &&
    (section.basis.state ?? 'final') !== state
  ) {
    notes.push(
      'The design table has no creep allowance; the default equivalent temperature offset was used.',
    );
  }
  return {
    temperature,
    state,
    rulingSpan,
    rulingSpanOverridden: overridden,
    horizontalTension,
    rulingSpanSag,
    midspanSag: own.midspanSag,
    maxSag: own.maxSag,
    scaledSag: sagFromRulingSpan(rulingSpanSag, rulingSpan, spanGeometry.span),
    extrapolated,
    notes,
  };
}
