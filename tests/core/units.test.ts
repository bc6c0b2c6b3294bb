import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  QUANTITY_KINDS,
  UNIT_SYSTEMS,
  formatQuantity,
  fieldDecimals,
  fromSI,
  parseLocaleNumber,
  parseQuantity,
  toSI,
  unitLabel,
} from '../../core';
import { expectClose } from '../helpers/expect-close';

const FACTOR_TOLERANCE = 1e-15;
const ROUND_TRIP_TOLERANCE = 1e-12;
const PROPERTY_RUNS = { seed: 20260514, numRuns: 300 } as const;

describe('conversion factors', () => {
  it('1 ft = 0.3048 m and 1 in = 0.0254 m exactly (international yard and pound agreement, 1959; NIST SP 811 B.8)', () => {
    expect(toSI(1, 'length', 'us')).toBe(0.3048);
    expect(toSI(1, 'sag', 'us')).toBe(0.3048);
    expect(toSI(1, 'diameter', 'us')).toBe(0.0254);
  });

  it('1 lbf = 4.4482216152605 N (NIST SP 811 B.8: 1 lb = 0.45359237 kg exactly, g = 9.80665 m/s²)', () => {
    expectClose(toSI(1, 'tension', 'us'), 4.4482216152605, FACTOR_TOLERANCE, 'lbf');
  });

  it('1 lbf/ft = 14.59390 N/m (NIST SP 811 B.8, pound-force per foot)', () => {
    expectClose(toSI(1, 'weightPerLength', 'us'), 14.5939, 1e-6, 'lb/ft');
  });

  it('1 in² = 645.16 mm² exactly (NIST SP 811 B.8)', () => {
    expectClose(toSI(1, 'area', 'us'), 645.16e-6, FACTOR_TOLERANCE, 'in²');
  });

  it('1 psi = 6894.757 Pa (NIST SP 811 B.8), so 1 Msi = 6.894757 GPa', () => {
    expectClose(toSI(1, 'modulus', 'us'), 6.894757e9, 1e-6, 'Msi');
  });

  it('temperature: 32 °F = 0 °C, 212 °F = 100 °C, −40 °F = −40 °C (definition of the Fahrenheit scale)', () => {
    expect(toSI(32, 'temperature', 'us')).toBe(0);
    expectClose(toSI(212, 'temperature', 'us'), 100, FACTOR_TOLERANCE, '212 °F');
    expectClose(toSI(-40, 'temperature', 'us'), -40, FACTOR_TOLERANCE, '−40 °F');
    expectClose(fromSI(15.5, 'temperature', 'us'), 59.9, FACTOR_TOLERANCE, '15.5 °C');
  });

  it('a temperature difference of 9 °F is 5 °C (no offset)', () => {
    expectClose(toSI(9, 'temperatureDifference', 'us'), 5, FACTOR_TOLERANCE, 'ΔT');
  });

  it('aluminium expansion 23e-6 /°C is 12.78e-6 /°F (REFERENCES.md: aluminium 1350-H19 ≈ 23e-6 /°C; ×5/9)', () => {
    expectClose(fromSI(23e-6, 'expansion', 'us'), (23 * 5) / 9, 1e-14, 'per °F');
    expectClose(fromSI(23e-6, 'expansion', 'metric'), 23, 1e-14, 'per °C');
  });

  it('metric: 1 kg/m is 9.80665 N/m (standard gravity, 3rd CGPM 1901), 1 kN = 1000 N, 1 GPa = 1e9 Pa', () => {
    expect(toSI(1, 'weightPerLength', 'metric')).toBe(9.80665);
    expect(toSI(1, 'tension', 'metric')).toBe(1000);
    expect(toSI(1, 'modulus', 'metric')).toBe(1e9);
    expectClose(toSI(1, 'diameter', 'metric'), 1e-3, FACTOR_TOLERANCE, 'mm');
    expectClose(toSI(1, 'area', 'metric'), 1e-6, FACTOR_TOLERANCE, 'mm²');
  });

  it('angles are entered in degrees and stored in radians: 180° = π rad', () => {
    for (const system of UNIT_SYSTEMS)
      expectClose(toSI(180, 'angle', system), Math.PI, FACTOR_TOLERANCE, system);
  });

  it('1 lb/ft of conductor is 1.488164 kg/m (NIST SP 811 B.8, pound per foot)', () => {
    const stored = toSI(1, 'weightPerLength', 'us');
    expectClose(fromSI(stored, 'weightPerLength', 'metric'), 1.488164, 1e-6, 'kg/m');
  });
});

describe('round trips (values are stored in SI)', () => {
  const kinds = fc.constantFrom(...QUANTITY_KINDS);
  const systems = fc.constantFrom(...UNIT_SYSTEMS);
  // Physical values, not subnormals (a subnormal times 1e-6 underflows in any implementation).
  const magnitudes = fc
    .double({ min: -1e7, max: 1e7, noNaN: true, noDefaultInfinity: true })
    .filter((value) => value === 0 || Math.abs(value) > 1e-100);

  /**
   * Relative error. Temperature scales have an offset (0 °C is 32 °F), so there the error is taken relative to
   * at least 100 degrees; every other kind is a pure ratio and is judged purely relatively.
   */
  function roundTripError(kind: string, actual: number, expected: number): number {
    const floor = kind === 'temperature' ? 100 : Number.MIN_VALUE;
    return Math.abs(actual - expected) / Math.max(Math.abs(expected), floor);
  }

  it('fromSI(toSI(x)) and toSI(fromSI(x)) return x to 1e-12 for every kind in both systems', () => {
    fc.assert(
      fc.property(kinds, systems, magnitudes, (kind, system, value) => {
        const viaSI = fromSI(toSI(value, kind, system), kind, system);
        const viaDisplay = toSI(fromSI(value, kind, system), kind, system);
        return (
          roundTripError(kind, viaSI, value) <= ROUND_TRIP_TOLERANCE &&
          roundTripError(kind, viaDisplay, value) <= ROUND_TRIP_TOLERANCE
        );
      }),
      PROPERTY_RUNS,
    );
  });

  it('a value typed to field precision shows again exactly as typed after conversion to SI', () => {
    fc.assert(
      fc.property(kinds, systems, fc.integer({ min: -9_999_999, max: 9_999_999 }), (kind, system, steps) => {
        const decimals = fieldDecimals(kind, system);
        const typed = (steps / 10 ** decimals).toFixed(decimals);
        const parsed = parseQuantity(typed, kind, system);
        if (!parsed.ok) return false;
        const shown = formatQuantity(parsed.value, kind, system).value;
        return shown === typed || (Number(typed) === 0 && Number(shown) === 0);
      }),
      PROPERTY_RUNS,
    );
  });
});

describe('formatQuantity', () => {
  it('gives the unit and the field precision of the system', () => {
    expect(formatQuantity(0.5, 'sag', 'us')).toStrictEqual({ value: '1.64', unit: 'ft' });
    expect(formatQuantity(0.5, 'sag', 'metric')).toStrictEqual({ value: '0.50', unit: 'm' });
    expect(formatQuantity(25_000, 'tension', 'metric')).toStrictEqual({ value: '25.00', unit: 'kN' });
    expect(formatQuantity(25_000, 'tension', 'us')).toStrictEqual({ value: '5620', unit: 'lbf' });
    expect(formatQuantity(0, 'temperature', 'us')).toStrictEqual({ value: '32.0', unit: '°F' });
  });

  it('uses the locale decimal separator when a locale is given', () => {
    expect(formatQuantity(2.345, 'sag', 'metric', { locale: 'de-DE' }).value).toBe('2,35');
    expect(formatQuantity(12_345.6, 'length', 'metric', { locale: 'en-US' }).value).toBe('12345.60');
  });

  it('never shows NaN or Infinity, and never "-0.00"', () => {
    expect(formatQuantity(Number.NaN, 'sag', 'metric').value).toBe('—');
    expect(formatQuantity(Number.POSITIVE_INFINITY, 'tension', 'us').value).toBe('—');
    expect(formatQuantity(-0.001, 'sag', 'metric').value).toBe('0.00');
  });

  it('labels every kind in both systems', () => {
    for (const system of UNIT_SYSTEMS) {
      for (const kind of QUANTITY_KINDS) expect(unitLabel(kind, system)).not.toBe('');
    }
    expect(unitLabel('weightPerLength', 'metric')).toBe('kg/m');
    expect(unitLabel('weightPerLength', 'us')).toBe('lb/ft');
  });
});

describe('parseLocaleNumber', () => {
  it('accepts the locale decimal comma and the point alike (de-DE, fr-FR)', () => {
    expect(parseLocaleNumber('12,5', 'de-DE')).toStrictEqual({ ok: true, value: 12.5 });
    expect(parseLocaleNumber('12.5', 'de-DE')).toStrictEqual({ ok: true, value: 12.5 });
    expect(parseLocaleNumber(' 0,75 ', 'fr-FR')).toStrictEqual({ ok: true, value: 0.75 });
  });

  it('accepts signs, the typographic minus and exponents', () => {
    expect(parseLocaleNumber('−3.5')).toStrictEqual({ ok: true, value: -3.5 });
    expect(parseLocaleNumber('+4')).toStrictEqual({ ok: true, value: 4 });
    expect(parseLocaleNumber('2.3e-5')).toStrictEqual({ ok: true, value: 2.3e-5 });
    expect(parseLocaleNumber('.5')).toStrictEqual({ ok: true, value: 0.5 });
  });

  it('refuses a comma where the locale uses a point, so 1,234 is never read as 1.234 or 1234', () => {
    expect(parseLocaleNumber('12,5', 'en-US')).toMatchObject({ ok: false, reason: 'separator' });
    expect(parseLocaleNumber('1,234')).toMatchObject({ ok: false, reason: 'separator' });
  });

  it('refuses two separators (thousands grouping) in a comma locale', () => {
    expect(parseLocaleNumber('1.234,5', 'de-DE')).toMatchObject({ ok: false, reason: 'separator' });
    expect(parseLocaleNumber('1,2,3', 'de-DE')).toMatchObject({ ok: false, reason: 'separator' });
  });

  it('refuses empty input, text, NaN, Infinity and overflow with a message', () => {
    expect(parseLocaleNumber('   ')).toMatchObject({ ok: false, reason: 'empty' });
    for (const text of ['abc', 'NaN', 'Infinity', '12 m', '1..2', '-', '0x10']) {
      const parsed = parseLocaleNumber(text);
      expect(parsed, text).toMatchObject({ ok: false, reason: 'not-a-number' });
      if (!parsed.ok) expect(parsed.message).not.toBe('');
    }
    expect(parseLocaleNumber('1e400')).toMatchObject({ ok: false, reason: 'too-large' });
  });

  it('falls back to the point for an unknown locale tag', () => {
    expect(parseLocaleNumber('3.25', 'not a locale!')).toStrictEqual({ ok: true, value: 3.25 });
  });

  it('reads back every finite double as printed by String(), also with a decimal comma in de-DE', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), (value) => {
        const expected = value === 0 ? 0 : value;
        const plain = parseLocaleNumber(String(value));
        const comma = parseLocaleNumber(String(value).replace('.', ','), 'de-DE');
        return plain.ok && comma.ok && Object.is(plain.value, expected) && Object.is(comma.value, expected);
      }),
      PROPERTY_RUNS,
    );
  });

  it('parseQuantity converts to SI: "6,5" ft in de-DE is 1.9812 m', () => {
    const parsed = parseQuantity('6,5', 'sag', 'us', 'de-DE');
    if (!parsed.ok) throw new Error(parsed.message);
    expectClose(parsed.value, 1.9812, 1e-15, '6.5 ft');
  });
});
