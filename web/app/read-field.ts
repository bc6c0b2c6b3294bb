// Turns typed text into an SI value or a message for the field. Screens validate with these and show the message
// beside the field; nothing here throws.
import { parseQuantity, type QuantityKind, type UnitSystem } from '../../core/units';
import { userLocale } from './format';

export type FieldRead = { value: number; error: null } | { value: undefined; error: string | null };

export interface FieldRules {
  /** Empty text is an error ("Enter a number.") when true, otherwise simply no value. */
  required?: boolean;
  /** Must be > 0 (SI). */
  positive?: boolean;
  /** Must be ≥ 0 (SI). */
  nonNegative?: boolean;
  /** Whole number (counts). */
  integer?: boolean;
  /** Inclusive bounds in SI, with the message to show when outside. */
  min?: { value: number; message: string };
  max?: { value: number; message: string };
}

export function readField(
  text: string | undefined,
  kind: QuantityKind,
  system: UnitSystem,
  rules: FieldRules = {},
): FieldRead {
  const typed = text ?? '';
  if (typed.trim() === '') return { value: undefined, error: rules.required ? 'Enter a number.' : null };
  const parsed = parseQuantity(typed, kind, system, userLocale());
  if (!parsed.ok) return { value: undefined, error: parsed.message };
  const value = parsed.value;
  if (rules.positive && !(value > 0)) return { value: undefined, error: 'Must be greater than zero.' };
  if (rules.nonNegative && value < 0) return { value: undefined, error: 'Cannot be negative.' };
  if (rules.integer && !Number.isInteger(value)) return { value: undefined, error: 'Enter a whole number.' };
  if (rules.min && value < rules.min.value) return { value: undefined, error: rules.min.message };
  if (rules.max && value > rules.max.value) return { value: undefined, error: rules.max.message };
  return { value, error: null };
}
