/**
 * Unit systems at the edges of the app. Everything stored and computed is SI (m, N, N/m, °C, Pa, 1/°C, rad, s);
 * forms parse what the user types in the line's units into SI, and screens format SI back for display.
 *
 * Exact factors (NIST SP 811, appendix B; the 1959 international yard and pound agreement):
 * 1 ft = 0.3048 m, 1 in = 0.0254 m, 1 lb = 0.45359237 kg, standard gravity 9.80665 m/s² (3rd CGPM, 1901),
 * hence 1 lbf = 0.45359237 × 9.80665 N = 4.4482216152605 N. °F = °C·9/5 + 32.
 */

export type UnitSystem = 'metric' | 'us';

export const UNIT_SYSTEMS: readonly UnitSystem[] = ['metric', 'us'];

export type QuantityKind =
  | 'length'
  | 'sag'
  | 'tension'
  | 'weightPerLength'
  | 'temperature'
  | 'temperatureDifference'
  | 'diameter'
  | 'area'
  | 'modulus'
  | 'expansion'
  | 'angle'
  | 'time'
  | 'percent';

export const QUANTITY_KINDS: readonly QuantityKind[] = [
  'length',
  'sag',
  'tension',
  'weightPerLength',
  'temperature',
  'temperatureDifference',
  'diameter',
  'area',
  'modulus',
  'expansion',
  'angle',
  'time',
  'percent',
];

/** m per foot, exact (1959 agreement). */
export const METRES_PER_FOOT = 0.3048;
/** m per inch, exact. */
export const METRES_PER_INCH = 0.0254;
/** kg per pound, exact (1959 agreement). */
export const KILOGRAMS_PER_POUND = 0.45359237;
/** Standard gravity, m/s², exact by definition (also core/catenary's STANDARD_GRAVITY). */
const GRAVITY = 9.80665;
/** N per pound-force = 0.45359237 kg × 9.80665 m/s², exact. */
export const NEWTONS_PER_POUND_FORCE = KILOGRAMS_PER_POUND * GRAVITY;
/** Pa per psi = 1 lbf / in². */
export const PASCALS_PER_PSI = NEWTONS_PER_POUND_FORCE / (METRES_PER_INCH * METRES_PER_INCH);

/** One display unit: its label, the decimals a field shows, and the conversions to and from SI. */
interface DisplayUnit {
  unit: string;
  decimals: number;
  toSI: (value: number) => number;
  fromSI: (valueSI: number) => number;
}

/** A unit that is a pure multiple of the SI unit: SI = value × factor. */
function scaled(unit: string, factor: number, decimals: number): DisplayUnit {
  return { unit, decimals, toSI: (value) => value * factor, fromSI: (valueSI) => valueSI / factor };
}

const CELSIUS: DisplayUnit = {
  unit: '°C',
  decimals: 1,
  toSI: (value) => value,
  fromSI: (valueSI) => valueSI,
};
const FAHRENHEIT: DisplayUnit = {
  unit: '°F',
  decimals: 1,
  toSI: (value) => ((value - 32) * 5) / 9,
  fromSI: (valueSI) => (valueSI * 9) / 5 + 32,
};

// Field precision: fine enough for the instruments in use, coarse enough not to pretend. Sag and lengths to the
// centimetre (metric) or hundredth of a foot (≈ 3 mm), tension to 10 N or 1 lbf, angles to 0.0001° (≈ 0.4″, finer
// than a field transit reads), temperatures to 0.1°.
const UNITS: Record<UnitSystem, Record<QuantityKind, DisplayUnit>> = {
  metric: {
    length: scaled('m', 1, 2),
    sag: scaled('m', 1, 2),
    tension: scaled('kN', 1000, 2),
    // Weight per length is entered as mass per length (what tables print) and stored as N/m under standard gravity.
    weightPerLength: scaled('kg/m', GRAVITY, 3),
    temperature: CELSIUS,
    temperatureDifference: scaled('°C', 1, 1),
    diameter: scaled('mm', 1e-3, 2),
    area: scaled('mm²', 1e-6, 1),
    modulus: scaled('GPa', 1e9, 1),
    expansion: scaled('×10⁻⁶/°C', 1e-6, 2),
    angle: scaled('°', Math.PI / 180, 4),
    time: scaled('s', 1, 2),
    percent: scaled('%', 1, 1),
  },
  us: {
    length: scaled('ft', METRES_PER_FOOT, 2),
    sag: scaled('ft', METRES_PER_FOOT, 2),
    tension: scaled('lbf', NEWTONS_PER_POUND_FORCE, 0),
    weightPerLength: scaled('lb/ft', NEWTONS_PER_POUND_FORCE / METRES_PER_FOOT, 4),
    temperature: FAHRENHEIT,
    temperatureDifference: scaled('°F', 5 / 9, 1),
    diameter: scaled('in', METRES_PER_INCH, 3),
    area: scaled('in²', METRES_PER_INCH * METRES_PER_INCH, 4),
    modulus: scaled('Msi', 1e6 * PASCALS_PER_PSI, 2),
    // 1/°F is 5/9 of the same figure per °C, so SI (per °C) = value per °F × 9/5.
    expansion: scaled('×10⁻⁶/°F', 1e-6 * (9 / 5), 2),
    angle: scaled('°', Math.PI / 180, 4),
    time: scaled('s', 1, 2),
    percent: scaled('%', 1, 1),
  },
};

/**
 * Converts a value in the display unit of `system` to SI.
 * SI units by kind: length/sag/diameter m, tension N, weightPerLength N/m, temperature °C, temperatureDifference
 * °C (K), area m², modulus Pa, expansion 1/°C, angle rad, time s, percent % (kept as a percentage).
 */
export function toSI(value: number, kind: QuantityKind, system: UnitSystem): number {
  return UNITS[system][kind].toSI(value);
}

/** Converts an SI value (see toSI for the SI unit of each kind) to the display unit of `system`. */
export function fromSI(valueSI: number, kind: QuantityKind, system: UnitSystem): number {
  return UNITS[system][kind].fromSI(valueSI);
}

/** The display unit label of `kind` in `system`, e.g. 'kN' or 'lb/ft'. */
export function unitLabel(kind: QuantityKind, system: UnitSystem): string {
  return UNITS[system][kind].unit;
}

/** Decimals shown for `kind` in `system` (see the precision note above the unit table). */
export function fieldDecimals(kind: QuantityKind, system: UnitSystem): number {
  return UNITS[system][kind].decimals;
}

/** Shown instead of a number when there is none to show (never 'NaN'). */
export const NO_VALUE = '—';

/**
 * Formats an SI value for display in `system`, rounded to the field precision of `kind`.
 * Without a locale the number uses '.' and no grouping (parseLocaleNumber reads it back); with a BCP 47 locale
 * it uses that locale's decimal separator, still without grouping. Non-finite values give NO_VALUE.
 */
export function formatQuantity(
  valueSI: number,
  kind: QuantityKind,
  system: UnitSystem,
  options?: { locale?: string; decimals?: number },
): { value: string; unit: string } {
  const display = UNITS[system][kind];
  const shown = display.fromSI(valueSI);
  if (!Number.isFinite(shown)) return { value: NO_VALUE, unit: display.unit };
  const decimals = options?.decimals ?? display.decimals;
  // Avoid '-0.00' for tiny negatives that round to zero.
  const rounded = Number(shown.toFixed(decimals)) === 0 ? 0 : shown;
  const text =
    options?.locale === undefined
      ? rounded.toFixed(decimals)
      : safeNumberFormat(options.locale, decimals).format(rounded);
  return { value: text, unit: display.unit };
}

function safeNumberFormat(locale: string, decimals: number): Intl.NumberFormat {
  const settings = { minimumFractionDigits: decimals, maximumFractionDigits: decimals, useGrouping: false };
  try {
    return new Intl.NumberFormat(locale, settings);
  } catch {
    return new Intl.NumberFormat('en-US', settings);
  }
}

/** Why a typed number was refused. */
export type NumberParseFailure = 'empty' | 'not-a-number' | 'separator' | 'too-large';

/** Result of reading a typed number: a finite value, or a message to show beside the field. Never NaN. */
export type NumberParse =
  { ok: true; value: number } | { ok: false; reason: NumberParseFailure; message: string };

/** The decimal separator of a BCP 47 locale ('.' when the locale is unknown or absent). */
export function decimalSeparator(locale?: string): string {
  if (locale === undefined) return '.';
  try {
    const parts = new Intl.NumberFormat(locale).formatToParts(1.5);
    return parts.find((part) => part.type === 'decimal')?.value ?? '.';
  } catch {
    return '.';
  }
}

const PLAIN_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

/**
 * Reads a number typed in a field. Accepts '.' always and the locale's decimal separator (so '12,5' is 12.5 in
 * de-DE), an optional sign (also the typographic minus '−') and an exponent ('2.3e-5'). Refuses thousands
 * separators, two separators, text and empty input, each with a plain-language message; never returns NaN or
 * ±Infinity.
 * @param text what the user typed
 * @param locale BCP 47 tag of the user's locale (e.g. navigator.language); absent: '.' is the only separator
 */
export function parseLocaleNumber(text: string, locale?: string): NumberParse {
  const trimmed = text.trim().replace(/\u2212/g, '-');
  if (trimmed === '') return { ok: false, reason: 'empty', message: 'Enter a number.' };
  const separator = decimalSeparator(locale);
  let normalised = trimmed;
  if (separator !== '.' && trimmed.includes(separator)) {
    const count = trimmed.split(separator).length - 1;
    if (count > 1 || trimmed.includes('.')) {
      return {
        ok: false,
        reason: 'separator',
        message: `Use one decimal separator ("12${separator}5" or "12.5") and no thousands separators.`,
      };
    }
    normalised = trimmed.replace(separator, '.');
  }
  if (!PLAIN_NUMBER.test(normalised)) {
    if (separator === '.' && /^[+-]?[\d.]*,[\d.,]*$/.test(normalised)) {
      return {
        ok: false,
        reason: 'separator',
        message: 'Use "." as the decimal point, with no thousands separators.',
      };
    }
    const shown = trimmed.length > 20 ? `${trimmed.slice(0, 20)}…` : trimmed;
    return { ok: false, reason: 'not-a-number', message: `"${shown}" is not a number.` };
  }
  const value = Number(normalised);
  if (!Number.isFinite(value))
    return { ok: false, reason: 'too-large', message: 'That number is too large.' };
  return { ok: true, value: value === 0 ? 0 : value };
}

/**
 * Reads a typed quantity in the display unit of `system` and returns it in SI (see toSI). Same refusals as
 * parseLocaleNumber, plus 'too-large' when the conversion overflows.
 */
export function parseQuantity(
  text: string,
  kind: QuantityKind,
  system: UnitSystem,
  locale?: string,
): NumberParse {
  const parsed = parseLocaleNumber(text, locale);
  if (!parsed.ok) return parsed;
  const valueSI = toSI(parsed.value, kind, system);
  if (!Number.isFinite(valueSI))
    return { ok: false, reason: 'too-large', message: 'That number is too large.' };
  return { ok: true, value: valueSI };
}
