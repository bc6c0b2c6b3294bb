/**
 * One door to the state-change models for the assessment: the knee-point model when the conductor has a
 * steel/aluminium split, the linear-elastic one otherwise, and the geometry the section's state change runs on.
 */
import { DEFAULT_CREEP_TEMPERATURE_OFFSET, tensionAtState, tensionAtStateComposite } from '../state-change';
import { SpanInputError } from '../errors';
import type { SpanGeometry } from '../types';
import type { AssessConductor, DesignBasisInput, SectionDesignInput, WireState } from './types';
import { rulingSpan } from '../ruling-span';

/** A known state of the wire: H (N) at a conductor temperature (°C) in the initial or final condition. */
export interface KnownWireState {
  horizontalTension: number;
  temperature: number;
  state: WireState;
}

/**
 * The temperature at which the initial (as strung) wire hangs as this wire does, °C: t for an initial wire,
 * t + creepOffset for a final (crept) one. Every change of state of the assessment runs in this one frame, so
 * chained changes (design → reading → hot day) agree whatever the conditions; the shift between two conditions is
 * the one core/state-change creepAdjustedTemperature gives.
 */
export function initialEquivalentTemperature(
  temperature: number,
  state: WireState,
  creepOffset: number,
): number {
  return state === 'final' ? temperature + creepOffset : temperature;
}

/**
 * Horizontal tension of a conductor after a change of temperature, load and creep condition, N.
 * @param g span the change is computed on (the level ruling span of the section, see stateGeometry), m
 * @param conductor weight (N/m), modulus (Pa), area (m²), expansion (1/°C), optional steel/aluminium split
 * @param from known H₁ > 0 N at t₁ °C in condition initial/final, under the bare weight
 * @param to wanted temperature t₂ °C, condition, and load per length (N/m; the bare weight when absent)
 * @param creepOffset creep allowance as an equivalent temperature rise, °C: a final (crept) wire at t behaves as
 *   the initial wire at t + offset (initialEquivalentTemperature)
 * Method: core/state-change tensionAtStateComposite (steel core alone above the knee point) when the conductor
 * has a composite description, else tensionAtState with EA = modulus·area; both exact catenary, Brent to 1e-13.
 */
export function changeWireState(
  g: SpanGeometry,
  conductor: AssessConductor,
  from: KnownWireState,
  to: { temperature: number; state: WireState; weight?: number },
  creepOffset: number,
): number {
  const known = {
    horizontalTension: from.horizontalTension,
    temperature: initialEquivalentTemperature(from.temperature, from.state, creepOffset),
    weight: conductor.weight,
  };
  const target = {
    temperature: initialEquivalentTemperature(to.temperature, to.state, creepOffset),
    weight: to.weight ?? conductor.weight,
  };
  if (conductor.composite) return tensionAtStateComposite(g, conductor.composite, known, target);
  return tensionAtState(
    g,
    { axialStiffness: conductor.modulus * conductor.area, expansion: conductor.expansion },
    known,
    target,
  );
}

/** Ruling span of the section, m, and whether it is the user's override (else √(ΣS³/ΣS) of spanLengths). */
export function sectionRulingSpan(section: SectionDesignInput): { rulingSpan: number; overridden: boolean } {
  const override = section.rulingSpanOverride;
  if (override !== undefined) {
    if (!Number.isFinite(override) || override <= 0) {
      throw new SpanInputError('span-not-positive', 'The ruling span must be a number greater than zero.');
    }
    return { rulingSpan: override, overridden: true };
  }
  return { rulingSpan: rulingSpan(section.spanLengths), overridden: false };
}

/**
 * Geometry the section's changes of state run on: the level ruling span. All spans between dead-ends share one
 * horizontal tension (suspension insulators swing to equalize it), and the ruling span is the single level span
 * whose tension changes with temperature and load as the section's does. A section of one span with no override
 * uses that span's own geometry (rise included), which is exact for a dead-ended span.
 */
export function stateGeometry(section: SectionDesignInput, spanGeometry: SpanGeometry): SpanGeometry {
  if (section.rulingSpanOverride === undefined && section.spanLengths.length === 1) return spanGeometry;
  return { span: sectionRulingSpan(section).rulingSpan, rise: 0 };
}

/** Creep allowance of the design basis, °C: as stated, or for a table without one, the default (≈ 21 °C, derived). */
export function creepOffsetOf(basis: DesignBasisInput): number {
  const offset =
    basis.kind === 'tension' ? basis.creepOffset : (basis.creepOffset ?? DEFAULT_CREEP_TEMPERATURE_OFFSET);
  if (!Number.isFinite(offset) || offset < 0) {
    throw new SpanInputError('state-invalid', 'The creep allowance must be a temperature of zero or more.');
  }
  return offset;
}
