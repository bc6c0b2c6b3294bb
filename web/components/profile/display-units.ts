// Length helpers for the drawings and the shot form, on top of the shared unit module (core/units.ts).
import { formatQuantity, fromSI, toSI, unitLabel, type UnitSystem } from '../../../core/units';

export type { UnitSystem };

/** Metres → the system's display length (m or ft). */
export function lengthToDisplay(metres: number, units: UnitSystem): number {
  return fromSI(metres, 'length', units);
}

/** The system's display length (m or ft) → metres. */
export function lengthFromDisplay(value: number, units: UnitSystem): number {
  return toSI(value, 'length', units);
}

/** Unit symbol of lengths in a system. */
export function lengthUnit(units: UnitSystem): string {
  return unitLabel('length', units);
}

/**
 * A length in metres as text in the system's unit, e.g. "3.71 m" or "12.17 ft" (two decimals unless told), with
 * a typographic minus; "—" instead of NaN.
 */
export function formatLength(metres: number, units: UnitSystem, decimals?: number): string {
  const shown = formatQuantity(metres, 'length', units, decimals === undefined ? undefined : { decimals });
  return `${shown.value.replace('-', '−')} ${shown.unit}`;
}
