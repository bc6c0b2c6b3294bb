/**
 * The textbook parabola (load spread uniformly per horizontal metre), for COMPARISON ONLY: the app shows these
 * beside the exact catenary results where an inspector would compare with hand calculations, never instead of
 * them. Every function here is a closed form with no validation beyond what the formula needs; all SI units.
 * For an inclined span the parabola's sag below the chord at midspan is the same w·S²/(8H) as for a level span.
 */
import { STANDARD_GRAVITY } from './catenary';

/**
 * Parabolic midspan sag D = w·S²/(8H), m.
 * @param span S > 0 m; @param weight w > 0 N/m; @param horizontalTension H > 0 N
 */
export function parabolicSag(span: number, weight: number, horizontalTension: number): number {
  return (weight * span * span) / (8 * horizontalTension);
}

/**
 * Parabolic horizontal tension from a midspan sag, H = w·S²/(8D), N.
 * @param span S > 0 m; @param weight w > 0 N/m; @param sag D > 0 m (vertical, chord to wire at midspan)
 */
export function parabolicTensionFromSag(span: number, weight: number, sag: number): number {
  return (weight * span * span) / (8 * sag);
}

/**
 * Parabolic midspan sag from a tangent sight line with targets a below the near and b below the far attachment:
 * D = ((√a + √b)/2)², m. Derived: the parabola's sag d = 4D·f·(1 − f) touches a·(1 − f) + b·f (REFERENCES,
 * 'Sighting methods'). @param nearDrop a ≥ 0 m; @param farDrop b ≥ 0 m
 */
export function parabolicSightLineSag(nearDrop: number, farDrop: number): number {
  const half = (Math.sqrt(nearDrop) + Math.sqrt(farDrop)) / 2;
  return half * half;
}

/**
 * Horizontal distance from the near support to the parabola's touching point, x = S·√a/(√a + √b), m.
 * @param span S > 0 m; @param nearDrop a ≥ 0 m; @param farDrop b ≥ 0 m (not both 0)
 */
export function parabolicSightLineTouchX(span: number, nearDrop: number, farDrop: number): number {
  const near = Math.sqrt(nearDrop);
  return (span * near) / (near + Math.sqrt(farDrop));
}

/**
 * Far-end drop of a sight line from an instrument a below the near attachment at vertical angle θ:
 * b = a + h − S·tan θ, m, i.e. the parabolic relation tan θ = (h + a − b)/S solved for b.
 * @param span S > 0 m; @param rise h m; @param nearDrop a m; @param angle θ rad above horizontal, toward the far support
 */
export function sightAngleFarDrop(span: number, rise: number, nearDrop: number, angle: number): number {
  return nearDrop + rise - span * Math.tan(angle);
}

/**
 * Parabolic midspan sag from an angle of sight: D = ((√a + √b)/2)² with b = a + h − S·tan θ, m.
 * @param span S > 0 m; @param rise h m; @param nearDrop a ≥ 0 m; @param angle θ rad (b must come out ≥ 0)
 */
export function parabolicSightAngleSag(span: number, rise: number, nearDrop: number, angle: number): number {
  return parabolicSightLineSag(nearDrop, sightAngleFarDrop(span, rise, nearDrop, angle));
}

/**
 * Sight angle θ = atan((h + a − b)/S), rad, that a parabola of midspan sag D would give with the instrument a below
 * the near attachment: b = (2√D − √a)², valid for a < 4D (REFERENCES, 'Sighting methods').
 * @param span S > 0 m; @param rise h m; @param nearDrop a ≥ 0 m; @param sag D > 0 m
 */
export function parabolicSightAngle(span: number, rise: number, nearDrop: number, sag: number): number {
  const far = 2 * Math.sqrt(sag) - Math.sqrt(nearDrop);
  return Math.atan((rise + nearDrop - far * far) / span);
}

/**
 * Return-wave rule D = g·t₁²/32, m, with t₁ = T/N the time of one return, s (RUS Bulletin 1726C-115 eq. 1:
 * D = 48.3·(T/2N)² inches with g = 32.2 ft/s²; here g = STANDARD_GRAVITY).
 * @param secondsPerReturn t₁ > 0 s
 */
export function parabolicReturnWaveSag(secondsPerReturn: number): number {
  return (STANDARD_GRAVITY * secondsPerReturn * secondsPerReturn) / 32;
}

/**
 * One return time the rule predicts for a sag, t₁ = √(32·D/g), s. @param sag D > 0 m
 */
export function parabolicReturnTime(sag: number): number {
  return Math.sqrt((32 * sag) / STANDARD_GRAVITY);
}
