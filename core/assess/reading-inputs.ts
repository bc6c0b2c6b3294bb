/**
 * The raw inputs of a reading as a flat list of uncertain numbers, and back: what the uncertainty propagation
 * perturbs. Each entry names the field it comes from so the app can show which input dominates.
 */
import { SpanInputError } from '../errors';
import type { Measurement, SpanGeometry } from '../types';
import { UNCERTAINTY_NAMES } from '../records/design';
import { DEFAULT_READING_UNCERTAINTY } from './defaults';
import type { UncertainInput } from './propagation';
import type { ClearanceSite, ReadingInput, ReadingUncertainty } from './types';

/** The reading with every perturbable number in place, plus a weight factor and a ground shift. */
export interface PerturbedReading {
  geometry: SpanGeometry;
  measurement: Measurement;
  conductorTemperature: number;
  /** Multiplies the conductor weight (1 at the best value). */
  weightFactor: number;
  site?: ClearanceSite;
}

/** The record's uncertainty names and the assessment's are one list (checked at compile time). */
const _sameNames = UNCERTAINTY_NAMES satisfies readonly (keyof ReadingUncertainty)[];

/**
 * Picks the known uncertainty names out of a loose name → value record (a reading's or section's stored
 * overrides), keeping finite, non-negative values; undefined when none is left.
 */
export function knownUncertainties(
  values: Readonly<Record<string, number | undefined>> | undefined,
): Partial<ReadingUncertainty> | undefined {
  if (!values) return undefined;
  const picked: Partial<ReadingUncertainty> = {};
  let any = false;
  for (const name of UNCERTAINTY_NAMES) {
    const value = values[name];
    if (value !== undefined && Number.isFinite(value) && value >= 0) {
      picked[name] = value;
      any = true;
    }
  }
  return any ? picked : undefined;
}

/** Uncertainties of a reading: defaults, overridden by section settings, overridden by the reading's own. */
export function resolveUncertainty(
  ...layers: (Partial<ReadingUncertainty> | undefined)[]
): ReadingUncertainty {
  const resolved: ReadingUncertainty = { ...DEFAULT_READING_UNCERTAINTY };
  for (const layer of layers) {
    if (!layer) continue;
    for (const key of Object.keys(layer) as (keyof ReadingUncertainty)[]) {
      const value = layer[key];
      if (value !== undefined) resolved[key] = value;
    }
  }
  return resolved;
}

function measurementInputs(m: Measurement, u: ReadingUncertainty): UncertainInput[] {
  switch (m.method) {
    case 'midspan-sag':
      return [{ name: 'sag', value: m.sag, sigma: u.sag }];
    case 'offset-sag':
      return [
        { name: 'offset x', value: m.x, sigma: u.offsetX },
        { name: 'sag', value: m.sag, sigma: u.sag },
      ];
    case 'sight-line':
      return [
        { name: 'near target drop', value: m.nearDrop, sigma: u.drop },
        { name: 'far target drop', value: m.farDrop, sigma: u.drop },
      ];
    case 'sight-angle':
      return [
        { name: 'instrument drop', value: m.nearDrop, sigma: u.drop },
        { name: 'sight angle', value: m.angle, sigma: u.angle },
      ];
    case 'return-wave':
      return [{ name: 'timing', value: m.seconds, sigma: u.timing }];
    case 'surveyed-points':
      return m.points.flatMap((p, i) => [
        { name: `point ${i + 1} x`, value: p.x, sigma: u.point },
        { name: `point ${i + 1} z`, value: p.z, sigma: u.point },
      ]);
    default:
      throw new SpanInputError('unknown-method', 'This reading method is not known.');
  }
}

function rebuildMeasurement(m: Measurement, v: number[]): Measurement {
  const at = (i: number): number => v[i] ?? Number.NaN;
  switch (m.method) {
    case 'midspan-sag':
      return { method: m.method, sag: at(0) };
    case 'offset-sag':
      return { method: m.method, x: at(0), sag: at(1) };
    case 'sight-line':
      return { method: m.method, nearDrop: at(0), farDrop: at(1) };
    case 'sight-angle':
      return { method: m.method, nearDrop: at(0), angle: at(1) };
    case 'return-wave':
      return { method: m.method, returns: m.returns, seconds: at(0) };
    case 'surveyed-points':
      return { method: m.method, points: m.points.map((_, i) => ({ x: at(2 * i), z: at(2 * i + 1) })) };
    default:
      throw new SpanInputError('unknown-method', 'This reading method is not known.');
  }
}

/**
 * Flattens a reading into uncertain inputs (span, rise, weight factor, temperature, the method's own readings,
 * and, with a site, the attachment elevation and a common ground shift) and gives the inverse mapping.
 * @param reading the reading
 * @param u resolved standard uncertainties
 */
export function readingInputs(
  reading: ReadingInput,
  u: ReadingUncertainty,
): { inputs: UncertainInput[]; rebuild: (values: number[]) => PerturbedReading } {
  const head: UncertainInput[] = [
    { name: 'span length', value: reading.geometry.span, sigma: u.span },
    { name: 'rise', value: reading.geometry.rise, sigma: u.rise },
    { name: 'conductor weight', value: 1, sigma: u.weightRelative },
    { name: 'conductor temperature', value: reading.conductorTemperature, sigma: u.temperature },
  ];
  const own = measurementInputs(reading.measurement, u);
  const site = reading.site;
  const tail: UncertainInput[] = site
    ? [
        { name: 'attachment elevation', value: site.nearAttachmentElevation, sigma: u.elevation },
        { name: 'ground elevation', value: 0, sigma: u.elevation },
      ]
    : [];
  const inputs = [...head, ...own, ...tail];
  const ownStart = head.length;
  const tailStart = ownStart + own.length;
  const rebuild = (values: number[]): PerturbedReading => {
    const at = (i: number): number => values[i] ?? Number.NaN;
    const perturbed: PerturbedReading = {
      geometry: { span: at(0), rise: at(1) },
      weightFactor: at(2),
      conductorTemperature: at(3),
      measurement: rebuildMeasurement(reading.measurement, values.slice(ownStart, tailStart)),
    };
    if (site) {
      const shift = at(tailStart + 1);
      perturbed.site = {
        ...site,
        nearAttachmentElevation: at(tailStart),
        groundPoints: site.groundPoints.map((p) => ({ x: p.x, elevation: p.elevation + shift })),
      };
    }
    return perturbed;
  };
  return { inputs, rebuild };
}
