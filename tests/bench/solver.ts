// Solver benchmark: solves per second for each field method and the cost of one back-solve measured in forward
// spanAtTension evaluations, on a seeded spread of spans (20–1000 m, rise/span −0.5…0.5, sag/span 0.3 %–10 %).
// The machine may be shared, so timings are this process's CPU time (not wall time) over many short interleaved
// rounds: solves per second from the best round, and each ratio as the median over rounds of the method's time
// against the forward time measured around it in the same round.
import { spanAtTension, wireElevation } from '../../core/catenary';
import { solveSpan } from '../../core/solve';
import type { Measurement, MethodId, SpanGeometry } from '../../core/types';

/** Goals from issue 2. */
const CLOSED_FORM_RATIO_GOAL = 4;
const RETURN_WAVE_RATE_GOAL = 200_000;
const POINT_FIT_RATE_GOAL = 40_000;
/** Exact inputs must come back to this relative error on H (checked before timing). */
const ROUND_TRIP_TOLERANCE = 1e-9;

interface BenchCase {
  geometry: SpanGeometry;
  weight: number;
  horizontalTension: number;
  readings: Record<MethodId, Measurement>;
}

/** mulberry32: a small seeded PRNG (public domain, T. Ettinger), so every run sees the same spans. */
function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function makeCases(count: number, seed: number): BenchCase[] {
  const random = seededRandom(seed);
  const between = (lo: number, hi: number) => lo + (hi - lo) * random();
  const cases: BenchCase[] = [];
  for (let i = 0; i < count; i++) {
    const span = between(20, 1000);
    const rise = span * between(-0.5, 0.5);
    const weight = between(1, 30);
    // Tension from the parabola at the drawn sag/span; the exact sag then differs a little, which is fine here.
    const horizontalTension = (weight * span) / (8 * between(0.003, 0.1));
    const geometry = { span, rise };
    const forward = spanAtTension(geometry, weight, horizontalTension);
    const c = horizontalTension / weight;
    const lowX = forward.lowPointX;
    const sagAtX = (x: number) => (rise * x) / span - wireElevation(x, c, lowX);
    const offsetX = span * between(0.05, 0.95);
    const touchX = span * between(0.15, 0.85);
    const slope = Math.sinh((touchX - lowX) / c);
    const touchZ = wireElevation(touchX, c, lowX);
    const nearDrop = slope * touchX - touchZ;
    const farDrop = rise - touchZ - slope * (span - touchX);
    const points = [0, 1, 2, 3, 4].map((j) => {
      const x = (span * (j + between(0.1, 0.9))) / 5;
      return { x, z: wireElevation(x, c, lowX) };
    });
    cases.push({
      geometry,
      weight,
      horizontalTension,
      readings: {
        'midspan-sag': { method: 'midspan-sag', sag: forward.midspanSag },
        'offset-sag': { method: 'offset-sag', x: offsetX, sag: sagAtX(offsetX) },
        'sight-line': { method: 'sight-line', nearDrop, farDrop },
        'sight-angle': { method: 'sight-angle', nearDrop, angle: Math.atan(slope) },
        'return-wave': { method: 'return-wave', returns: 3, seconds: 3 * forward.returnTime },
        'surveyed-points': { method: 'surveyed-points', points },
      },
    });
  }
  return cases;
}

const METHODS: readonly MethodId[] = [
  'midspan-sag',
  'offset-sag',
  'sight-line',
  'sight-angle',
  'return-wave',
  'surveyed-points',
];
const CLOSED_FORM: ReadonlySet<MethodId> = new Set([
  'midspan-sag',
  'offset-sag',
  'sight-line',
  'sight-angle',
]);

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = sorted.length >> 1;
  return sorted.length % 2 ? sorted[middle]! : 0.5 * (sorted[middle - 1]! + sorted[middle]!);
}

/** CPU time of this process (user + system), µs: unlike the wall clock it does not count time spent waiting
 * for a core while other processes run, so figures hold up on a shared machine. */
function cpuMicros(): number {
  const usage = process.cpuUsage();
  return usage.user + usage.system;
}

/** CPU microseconds per call of `pass` (which makes `callsPerPass` calls), run for about `millis` of CPU time. */
function timePerCall(
  pass: () => number,
  callsPerPass: number,
  millis: number,
): { micros: number; sink: number } {
  let sink = 0;
  let calls = 0;
  const start = cpuMicros();
  let now = start;
  while (now - start < millis * 1000) {
    sink += pass();
    calls += callsPerPass;
    now = cpuMicros();
  }
  return { micros: (now - start) / calls, sink };
}

export interface SolverBenchResult {
  forwardMicros: number;
  methods: {
    method: MethodId;
    micros: number;
    perSecond: number;
    ratio: number;
    goal: string;
    met: boolean;
  }[];
}

/** Runs the benchmark and prints a table; returns the figures. */
export function runSolverBench(
  options: { cases?: number; rounds?: number; roundMillis?: number; seed?: number } = {},
) {
  const cases = makeCases(options.cases ?? 512, options.seed ?? 20261201);
  const rounds = options.rounds ?? 25;
  const roundMillis = options.roundMillis ?? 25;

  // Check every solve first: a fast wrong answer is worth nothing.
  for (const method of METHODS) {
    for (const c of cases) {
      const solved = solveSpan(c.geometry, c.weight, c.readings[method]).horizontalTension;
      const error = Math.abs(solved - c.horizontalTension) / c.horizontalTension;
      if (!(error < ROUND_TRIP_TOLERANCE)) throw new Error(`${method}: relative error ${error} on H`);
    }
  }

  const forwardPass = () => {
    let sum = 0;
    for (const c of cases) sum += spanAtTension(c.geometry, c.weight, c.horizontalTension).midspanSag;
    return sum;
  };
  const methodPass = (method: MethodId) => () => {
    let sum = 0;
    for (const c of cases) sum += solveSpan(c.geometry, c.weight, c.readings[method]).horizontalTension;
    return sum;
  };
  const passes = METHODS.map((method) => ({ method, pass: methodPass(method) }));
  let best = Infinity;
  const bestByMethod = new Map<MethodId, number>();
  const ratiosByMethod = new Map<MethodId, number[]>(METHODS.map((method) => [method, []]));
  let sink = 0;
  for (let round = 0; round < rounds; round++) {
    // Forward timed right before and after the methods of the round, so each ratio compares like with like.
    const before = timePerCall(forwardPass, cases.length, roundMillis);
    const timings = passes.map(({ method, pass }) => ({
      method,
      timed: timePerCall(pass, cases.length, roundMillis),
    }));
    const after = timePerCall(forwardPass, cases.length, roundMillis);
    const forward = Math.min(before.micros, after.micros);
    best = Math.min(best, forward);
    sink += before.sink + after.sink;
    for (const { method, timed } of timings) {
      bestByMethod.set(method, Math.min(bestByMethod.get(method) ?? Infinity, timed.micros));
      ratiosByMethod.get(method)!.push(timed.micros / forward);
      sink += timed.sink;
    }
  }
  if (!Number.isFinite(sink)) throw new Error('benchmark results were not finite');

  const result: SolverBenchResult = { forwardMicros: best, methods: [] };
  for (const method of METHODS) {
    const micros = bestByMethod.get(method)!;
    const perSecond = 1e6 / micros;
    const ratio = median(ratiosByMethod.get(method)!);
    const goal = CLOSED_FORM.has(method)
      ? `ratio ≤ ${CLOSED_FORM_RATIO_GOAL}`
      : `≥ ${(method === 'return-wave' ? RETURN_WAVE_RATE_GOAL : POINT_FIT_RATE_GOAL).toLocaleString('en')}/s`;
    const met = CLOSED_FORM.has(method)
      ? ratio <= CLOSED_FORM_RATIO_GOAL
      : perSecond >= (method === 'return-wave' ? RETURN_WAVE_RATE_GOAL : POINT_FIT_RATE_GOAL);
    result.methods.push({ method, micros, perSecond, ratio, goal, met });
  }

  console.log(
    `solver benchmark: ${cases.length} spans, ${rounds} rounds; CPU time; rates from the best round, ratios the median of ` +
      `per-round ratios to the forward time of the same round (Node ${process.version})`,
  );
  console.log(
    `forward spanAtTension: ${best.toFixed(3)} µs (${Math.round(1e6 / best).toLocaleString('en')}/s)`,
  );
  console.log('method            µs/solve   solves/s   × forward   goal');
  for (const m of result.methods) {
    console.log(
      `${m.method.padEnd(17)} ${m.micros.toFixed(3).padStart(8)} ${Math.round(m.perSecond).toLocaleString('en').padStart(10)} ` +
        `${m.ratio.toFixed(2).padStart(10)}   ${m.goal} ${m.met ? 'met' : 'MISSED'}`,
    );
  }
  return result;
}
