// Shared fixture: a Drake (795 kcmil 26/7 ACSR) tension section designed to the handbook's 700 ft example.
import { findConductor, type AssessConductor, type SectionDesignInput } from '../../../core';

/** Exact conversions (NIST SP 811). */
export const FOOT = 0.3048;
export const POUND_FORCE = 4.4482216152605;
/** 60 °F in °C. */
export const SIXTY_F = ((60 - 32) * 5) / 9;

/**
 * Drake as in Douglass & Thrash, "Sag and Tension of Conductor" (Electric Power Engineering Handbook), Table 14.5:
 * 1.094 lb/ft; rated strength 31,200 lb (CPUC GO 95 App. B Table 23); moduli, expansion and the steel/aluminium
 * split from the project's conductor library (derived, rule of mixtures).
 */
export function drakeConductor(withComposite = true): AssessConductor {
  const library = findConductor('drake');
  if (!library) throw new Error('Drake missing from the conductor library');
  const conductor: AssessConductor = {
    weight: (1.094 * POUND_FORCE) / FOOT,
    ratedStrength: 31200 * POUND_FORCE,
    area: library.area,
    modulus: library.modulus,
    expansion: library.expansion,
    diameter: library.diameter,
  };
  if (withComposite && library.composite) conductor.composite = library.composite;
  return conductor;
}

/** The handbook's design condition: 6300 lb initial at 60 °F on a 700 ft ruling span, creep ≈ 21 °C (derived). */
export function drakeSection(overrides: Partial<SectionDesignInput> = {}): SectionDesignInput {
  return {
    conductor: drakeConductor(),
    basis: {
      kind: 'tension',
      horizontalTension: 6300 * POUND_FORCE,
      referenceTemperature: SIXTY_F,
      state: 'initial',
      creepOffset: 21,
    },
    spanLengths: [700 * FOOT],
    maxDesignTemperature: 100,
    terrainCategory: 2,
    ...overrides,
  };
}
