// Verdicts in words, in the line's units: the titles on the badges and the reason sentence beside them.
// Core's own reason strings are in metres; these say the same with formatQuantity.
import type { VerdictResult } from '../../core/assess/types';
import { formatQuantity, NO_VALUE, type QuantityKind, type UnitSystem } from '../../core/units';
import type { ShownVerdict } from './assess-line';

/** Short badge text per verdict. */
export const VERDICT_TITLES: Readonly<Record<ShownVerdict, string>> = {
  within: 'Within tolerance',
  'too-slack': 'Too slack',
  'too-tight': 'Too tight',
  recheck: 'Measure again',
  'no-design': 'No design yet',
  'no-reading': 'Not read yet',
  'cannot-solve': 'Cannot solve',
};

/** "8.12 m" in the line's units (a dash for a missing value). */
export function quantityText(valueSI: number, kind: QuantityKind, units: UnitSystem): string {
  const { value, unit } = formatQuantity(valueSI, kind, units);
  return unit === '%' ? `${value} %` : `${value} ${unit}`;
}

/** "+0.50 m" / "−0.20 m": signed, with a true minus sign. */
export function signedText(valueSI: number, kind: QuantityKind, units: UnitSystem): string {
  const { value, unit } = formatQuantity(valueSI, kind, units);
  if (value === NO_VALUE) return `${value} ${unit}`;
  const shown = value.startsWith('-') ? `−${value.slice(1)}` : Number(value) === 0 ? value : `+${value}`;
  return unit === '%' ? `${shown} %` : `${shown} ${unit}`;
}

/** "95 % band −0.05 to +0.15 m", or undefined when the band is unknown. */
export function bandText(
  low: number,
  high: number,
  kind: QuantityKind,
  units: UnitSystem,
): string | undefined {
  if (!Number.isFinite(low) || !Number.isFinite(high)) return undefined;
  const lowText = signedText(low, kind, units).replace(/ [^ ]+$/, '');
  return `95 % band ${lowText} to ${signedText(high, kind, units)}`;
}

/**
 * The reason for a verdict in one or two plain sentences, with the numbers in the line's units.
 * @param verdict core's verdict (sag deviation = measured − design, m; band; allowance)
 * @param designSag design midspan sag at the reading's temperature, m, when known
 */
export function verdictSentence(verdict: VerdictResult, units: UnitSystem, designSag?: number): string {
  const deviation = verdict.sagDeviation;
  const size = quantityText(Math.abs(deviation), 'sag', units);
  const direction = deviation >= 0 ? 'lower (slacker)' : 'higher (tighter)';
  const design =
    designSag !== undefined && Number.isFinite(designSag)
      ? ` than the design sag of ${quantityText(designSag, 'sag', units)}`
      : ' than designed';
  const tolerance = `±${quantityText(verdict.allowance, 'sag', units)}`;
  const band = bandText(verdict.band.low, verdict.band.high, 'sag', units);
  const bandPart = band ? ` (${band})` : '';
  switch (verdict.verdict) {
    case 'within':
      return `The wire hangs ${size} ${direction}${design}, inside the tolerance of ${tolerance}${bandPart}.`;
    case 'too-slack':
      return (
        `The wire hangs ${size} lower${design}: beyond the tolerance of ${tolerance} even allowing for the ` +
        `reading's uncertainty${bandPart}. It is too slack.`
      );
    case 'too-tight':
      return (
        `The wire hangs ${size} higher${design}: beyond the tolerance of ${tolerance} even allowing for the ` +
        `reading's uncertainty${bandPart}. It is too tight.`
      );
    case 'recheck':
      if (!band) {
        return (
          `The uncertainty of this reading could not be worked out, so it cannot decide. Measure again ` +
          `(best estimate: ${size} ${direction}${design}; tolerance ${tolerance}).`
        );
      }
      return (
        `The reading's uncertainty band${bandPart} crosses the tolerance of ${tolerance}, so it cannot decide ` +
        `(best estimate: ${size} ${direction}${design}). Measure again, ideally by a more precise method.`
      );
  }
}

/** The sentence for the verdicts that have no numbers behind them. */
export function plainVerdictSentence(verdict: Exclude<ShownVerdict, VerdictResult['verdict']>): string {
  switch (verdict) {
    case 'no-design':
      return 'Enter the design basis of this tension section to judge its wires.';
    case 'no-reading':
      return 'No reading of this wire yet.';
    case 'cannot-solve':
      return 'The readings of this wire could not be solved: open a reading to see why.';
  }
}
