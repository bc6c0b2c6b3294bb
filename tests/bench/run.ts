// Entry point of the benchmarks (`npx tsx tests/bench/run.ts`). Each area adds its runner here.
import { runSolverBench } from './solver';

runSolverBench();
