import { describe, it, expect } from 'vitest';
import {
  evaluateReading,
  normalGenerator,
  propagateLinear,
  propagateMonteCarlo,
  readingInputs,
  resolveUncertainty,
  spanAtTension,
  uniformGenerator,
  type Measurement,
  type ReadingInput,
} from '../../../core';
import { expectClose } from '../../helpers/expect-close';
import { drakeSection } from './drake-section';

const SEED = 20260501;
/** Monte Carlo draws: the relative standard error of a sample σ is ≈ 1/√(2n) = 1.1 % at n = 4000. */
const SAMPLES = 4000;
/** "Within a few percent" (issue 4): 5 %, about 4.5 standard errors of the Monte Carlo σ. */
const AGREEMENT = 0.05;

describe('seeded random numbers', () => {
  it('repeat exactly for one seed and differ for another', () => {
    const a = uniformGenerator(7);
    const b = uniformGenerator(7);
    const c = uniformGenerator(8);
    const first = [a(), a(), a()];
    expect([b(), b(), b()]).toEqual(first);
    expect(c()).not.toBe(first[0]);
  });

  it('give standard normal draws (mean 0, variance 1 within sampling error)', () => {
    // Box & Muller (1958): exact normal draws from uniform pairs. With n = 20000, the sample mean has standard
    // error 0.007 and the sample variance 0.01; 4 standard errors are allowed.
    const normal = normalGenerator(SEED);
    const n = 20000;
    let sum = 0;
    let squares = 0;
    for (let i = 0; i < n; i++) {
      const z = normal();
      sum += z;
      squares += z * z;
    }
    const mean = sum / n;
    expect(Math.abs(mean)).toBeLessThan(0.03);
    expectClose(squares / n - mean * mean, 1, 0.04);
  });
});

describe('linear propagation', () => {
  it('is exact for a linear model', () => {
    // JCGM 100:2008 eq. (10): for f = 3x − 2y, σ_f = √(9σ_x² + 4σ_y²) = √(9·0.04 + 4·0.09) = 0.848528.
    const result = propagateLinear(
      ([x = 0, y = 0]) => [3 * x - 2 * y],
      [
        { name: 'x', value: 5, sigma: 0.2 },
        { name: 'y', value: 0, sigma: 0.3 },
      ],
    );
    expectClose(result.sigmas[0] ?? Number.NaN, Math.sqrt(0.72), 1e-8);
  });
});

describe('linear propagation agrees with a seeded Monte Carlo on real readings', () => {
  const section = drakeSection({ spanLengths: [180, 213.36, 240] });
  const geometry = { span: 213.36, rise: 6 };
  const designH = 28000;
  const truth = spanAtTension(geometry, section.conductor.weight, designH);
  const cases: { name: string; measurement: Measurement }[] = [
    { name: 'midspan sag', measurement: { method: 'midspan-sag', sag: truth.midspanSag } },
    // Nonlinear in the timing (sag ∝ t²): RUS Bulletin 1726C-115 D = 48.3·(T/2N)² in inches.
    {
      name: 'return wave',
      measurement: { method: 'return-wave', returns: 3, seconds: 3 * truth.returnTime },
    },
    { name: 'sight line', measurement: { method: 'sight-line', nearDrop: 2.5, farDrop: 5.2 } },
  ];
  for (const { name, measurement } of cases) {
    it(`for ${name}: σ of H, sag deviation, corrected H and clearance within 5 %`, () => {
      const reading: ReadingInput = {
        geometry,
        measurement,
        conductorTemperature: 27,
        site: {
          nearAttachmentElevation: 22,
          groundPoints: [
            { x: -5, elevation: 1 },
            { x: 120, elevation: 0.5 },
            { x: 220, elevation: 4 },
          ],
          requiredClearance: 6,
        },
      };
      const { inputs, rebuild } = readingInputs(reading, resolveUncertainty());
      const model = (values: number[]): number[] => {
        const e = evaluateReading(section, {}, rebuild(values));
        return [
          e.measured.horizontalTension,
          e.sagDeviation,
          e.commonTemperatureTension,
          e.hot?.clearance ?? Number.NaN,
        ];
      };
      const linear = propagateLinear(model, inputs);
      const monteCarlo = propagateMonteCarlo(model, inputs, SAMPLES, SEED);
      expect(monteCarlo.failures).toBe(0);
      ['H', 'sag deviation', 'corrected H', 'clearance'].forEach((label, k) => {
        expectClose(
          linear.sigmas[k] ?? Number.NaN,
          monteCarlo.sigmas[k] ?? Number.NaN,
          AGREEMENT,
          `${name}: σ of ${label}`,
        );
      });
    });
  }
});
