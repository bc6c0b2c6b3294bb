/**
 * Propagation of input uncertainties to outputs: linear (first-order, numerical partial derivatives) and a
 * seeded Monte Carlo of the same model to check it.
 */
import { SpanInputError } from '../errors';
import { normalGenerator } from './seeded-random';

/** One uncertain scalar input: its best value and standard uncertainty (one σ, ≥ 0). */
export interface UncertainInput {
  name: string;
  value: number;
  sigma: number;
}

/** A model: input values in the order of the inputs → output values (fixed length). May throw. */
export type VectorModel = (values: number[]) => number[];

export interface LinearPropagation {
  /** Outputs at the best input values. */
  values: number[];
  /** Standard uncertainty of each output. */
  sigmas: number[];
  /** contributions[k][i] = |∂f_k/∂x_i|·σ_i, the part of output k's σ due to input i. */
  contributions: number[][];
}

/** Relative step of the central differences. */
export const DIFFERENCE_RELATIVE_STEP = 1e-6;
/** Step as a fraction of σ when the input value is 0 (rise, a shift). */
export const DIFFERENCE_SIGMA_STEP = 1e-3;

function checkInputs(inputs: UncertainInput[]): void {
  for (const input of inputs) {
    if (!Number.isFinite(input.value) || !Number.isFinite(input.sigma) || input.sigma < 0) {
      throw new SpanInputError(
        'uncertainty-invalid',
        `Uncertainty of ${input.name} must be a number of zero or more (and its value a number).`,
      );
    }
  }
}

/**
 * First-order (linear) propagation of independent input uncertainties: σ_k² = Σ_i (∂f_k/∂x_i · σ_i)².
 * @param model the output function; it must not throw at the best values
 * @param inputs best values and standard uncertainties, independent of each other
 * Method: central differences ∂f/∂x ≈ (f(x + δ) − f(x − δ))/(2δ) with a relative step δ = 1e-6·|x| (or
 * 1e-3·σ when x is 0); inputs with σ = 0 are skipped. The models are smooth and solved to 1e-13, so the step error
 * (≈ δ²) and the round-off (≈ 1e-13/δ relative) both stay far below the uncertainties. Source: JCGM 100:2008
 * (GUM) §5.1.2, law of propagation of uncertainty for uncorrelated inputs.
 * Throws whatever the model throws at a perturbed point (for example no-root when a shifted reading admits no wire).
 */
export function propagateLinear(model: VectorModel, inputs: UncertainInput[]): LinearPropagation {
  checkInputs(inputs);
  const x0 = inputs.map((input) => input.value);
  const values = model(x0);
  const contributions: number[][] = values.map(() => inputs.map(() => 0));
  inputs.forEach((input, i) => {
    if (input.sigma === 0) return;
    const step =
      input.value !== 0
        ? DIFFERENCE_RELATIVE_STEP * Math.abs(input.value)
        : DIFFERENCE_SIGMA_STEP * input.sigma;
    const plus = [...x0];
    const minus = [...x0];
    plus[i] = input.value + step;
    minus[i] = input.value - step;
    const up = model(plus);
    const down = model(minus);
    values.forEach((_, k) => {
      const derivative = ((up[k] ?? Number.NaN) - (down[k] ?? Number.NaN)) / (2 * step);
      const row = contributions[k];
      if (row) row[i] = Math.abs(derivative) * input.sigma;
    });
  });
  const sigmas = contributions.map((row) => Math.sqrt(row.reduce((sum, part) => sum + part * part, 0)));
  return { values, sigmas, contributions };
}

export interface MonteCarloPropagation {
  /** Sample mean and sample standard deviation (n − 1) of each output over the successful samples. */
  means: number[];
  sigmas: number[];
  /** Samples evaluated, and those where the model threw or gave a non-finite output (left out). */
  samples: number;
  failures: number;
}

/**
 * Monte Carlo propagation with normally distributed independent inputs, for checking propagateLinear.
 * @param model output function
 * @param inputs best values and standard uncertainties
 * @param samples number of draws (≥ 2)
 * @param seed 32-bit seed of the generator (mulberry32 + Box–Muller, core/assess/seeded-random)
 * Method: JCGM 101:2008 (GUM Supplement 1) adaptive-free Monte Carlo: draw each input as value + σ·z, evaluate,
 * take the sample mean and standard deviation (Welford's running update for accuracy).
 */
export function propagateMonteCarlo(
  model: VectorModel,
  inputs: UncertainInput[],
  samples: number,
  seed: number,
): MonteCarloPropagation {
  checkInputs(inputs);
  if (!Number.isInteger(samples) || samples < 2) {
    throw new SpanInputError('uncertainty-invalid', 'Monte Carlo needs at least two samples.');
  }
  const normal = normalGenerator(seed);
  let count = 0;
  let failures = 0;
  let means: number[] = [];
  let squares: number[] = [];
  for (let s = 0; s < samples; s++) {
    const draw = inputs.map((input) => input.value + input.sigma * normal());
    let out: number[];
    try {
      out = model(draw);
    } catch {
      failures++;
      continue;
    }
    if (!out.every(Number.isFinite)) {
      failures++;
      continue;
    }
    if (count === 0) {
      means = out.map(() => 0);
      squares = out.map(() => 0);
    }
    count++;
    out.forEach((value, k) => {
      const mean = means[k] ?? 0;
      const delta = value - mean;
      const next = mean + delta / count;
      means[k] = next;
      squares[k] = (squares[k] ?? 0) + delta * (value - next);
    });
  }
  const sigmas = squares.map((sum) => (count > 1 ? Math.sqrt(sum / (count - 1)) : Number.NaN));
  return { means, sigmas, samples, failures };
}
