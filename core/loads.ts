import { STANDARD_GRAVITY } from './catenary';
import { SpanInputError } from './errors';

/** Density of glaze ice commonly used for radial ice loads, kg/m³ (textbook value, e.g. Wadhwa Ex. 7.2). */
export const GLAZE_ICE_DENSITY = 910;

/** A loading case on a bare conductor. All SI. */
export interface LoadCase {
  /** Bare conductor weight per unit length, N/m, > 0. */
  bareWeight: number;
  /** Bare conductor diameter, m, > 0. */
  diameter: number;
  /** Radial ice thickness, m, ≥ 0 (default 0). */
  iceThickness?: number;
  /** Ice density, kg/m³, > 0 (default GLAZE_ICE_DENSITY). */
  iceDensity?: number;
  /** Wind pressure on the projected (iced) diameter, Pa, ≥ 0 (default 0). */
  windPressure?: number;
}

/** Components of the loaded weight, N/m. */
export interface ConductorLoad {
  /** Bare weight, N/m. */
  bare: number;
  /** Weight of the ice, N/m. */
  ice: number;
  /** Horizontal wind force, N/m. */
  wind: number;
  /** Vertical load (bare + ice), N/m. */
  vertical: number;
  /** Resultant √(vertical² + wind²), N/m: the weight to use in the catenary under this load. */
  resultant: number;
  /** Angle of the resultant from vertical (the plane in which the loaded span swings), rad. */
  swingAngle: number;
}

/**
 * Resultant load per unit length of a conductor with radial ice and wind, N/m.
 * Ice: w_i = ρ·g·π·t·(d + t) (the annulus between diameters d and d + 2t); wind: w_w = p·(d + 2t) on the iced
 * diameter; resultant √((w + w_i)² + w_w²). g = 9.80665 m/s². Closed form. Source: the standard loading formula of
 * textbook line design (J.B. Gupta, Elements of Power System, ch. 10; C.L. Wadhwa, Electrical Power Systems, ch. 7).
 */
export function conductorLoad(load: LoadCase): ConductorLoad {
  const thickness = load.iceThickness ?? 0;
  const density = load.iceDensity ?? GLAZE_ICE_DENSITY;
  const pressure = load.windPressure ?? 0;
  if (!Number.isFinite(load.bareWeight) || load.bareWeight <= 0) {
    throw new SpanInputError(
      'weight-not-positive',
      'Conductor weight per length must be a number greater than zero.',
    );
  }
  if (!Number.isFinite(load.diameter) || load.diameter <= 0) {
    throw new SpanInputError('conductor-invalid', 'Conductor diameter must be a number greater than zero.');
  }
  if (!Number.isFinite(thickness) || thickness < 0) {
    throw new SpanInputError('state-invalid', 'Ice thickness must be a number of zero or more.');
  }
  if (!Number.isFinite(density) || density <= 0) {
    throw new SpanInputError('state-invalid', 'Ice density must be a number greater than zero.');
  }
  if (!Number.isFinite(pressure) || pressure < 0) {
    throw new SpanInputError('state-invalid', 'Wind pressure must be a number of zero or more.');
  }
  const ice = density * STANDARD_GRAVITY * Math.PI * thickness * (load.diameter + thickness);
  const wind = pressure * (load.diameter + 2 * thickness);
  const vertical = load.bareWeight + ice;
  return {
    bare: load.bareWeight,
    ice,
    wind,
    vertical,
    resultant: Math.hypot(vertical, wind),
    swingAngle: Math.atan2(wind, vertical),
  };
}
