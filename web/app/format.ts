// The app's one way to show a number: SI in, "12.34 m" out, in the line's unit system and the user's decimal
// separator. Never shows NaN (core/units gives a dash for non-finite values).
import { formatQuantity, type QuantityKind, type UnitSystem } from '../../core/units';

/** The user's locale for decimal separators (browser setting). */
export function userLocale(): string | undefined {
  return typeof navigator === 'undefined' ? undefined : navigator.language;
}

/** "12.34 m" */
export function show(
  valueSI: number | undefined,
  kind: QuantityKind,
  system: UnitSystem,
  decimals?: number,
): string {
  const { value, unit } = formatQuantity(valueSI ?? Number.NaN, kind, system, {
    locale: userLocale(),
    ...(decimals === undefined ? {} : { decimals }),
  });
  return unit === '%' ? `${value} %` : `${value} ${unit}`;
}

/** The number alone, in the field's precision: to prefill a form field the user can edit. */
export function fieldText(valueSI: number | undefined, kind: QuantityKind, system: UnitSystem): string {
  if (valueSI === undefined || !Number.isFinite(valueSI)) return '';
  return formatQuantity(valueSI, kind, system, { locale: userLocale() }).value;
}

/** A recorded time shown in the user's locale. */
export function showTime(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime())
    ? iso
    : date.toLocaleString(userLocale(), { dateStyle: 'medium', timeStyle: 'short' });
}
