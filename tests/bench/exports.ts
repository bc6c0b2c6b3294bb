// Export bench in Node: a line of 5 000 spans (3 wires each, one reading per wire, every method) exported as the
// CSV inspection log, the JSON backup and GeoJSON. Prints median times of a few runs and the file sizes.
// Run: npx tsx tests/bench/exports.ts   (goal from the issue: each under 1 s for this line, in Chromium).
import os from 'node:os';
import { performance } from 'node:perf_hooks';
import {
  SpanInputError,
  backupJsonJob,
  inspectionLogJob,
  joinExportJob,
  lineGeoJson,
  parseBackup,
  solveSpan,
  type InspectionLogInput,
  type ReadingContext,
  type ReadingResult,
} from '../../core';
import { fixtureLine, fixtureLogInput } from '../core/exports/line-fixture';

const SPANS = 5_000;
const RUNS = 5;

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)] ?? Number.NaN;
}

/** CPU time of this process, ms: less sensitive than wall time to other work on a shared machine. */
function cpuMs(): number {
  const { user, system } = process.cpuUsage();
  return (user + system) / 1000;
}

function time(label: string, work: () => string | number): void {
  work(); // warm-up
  const wall: number[] = [];
  const cpu: number[] = [];
  let size = 0;
  for (let run = 0; run < RUNS; run += 1) {
    const startCpu = cpuMs();
    const start = performance.now();
    const result = work();
    wall.push(performance.now() - start);
    cpu.push(cpuMs() - startCpu);
    size = typeof result === 'string' ? Buffer.byteLength(result, 'utf8') : result;
  }
  const shown = (values: number[]): string => median(values).toFixed(0).padStart(6);
  console.log(
    `${label.padEnd(44)} ${shown(wall)} ms wall ${shown(cpu)} ms cpu  ${(size / 1e6).toFixed(2).padStart(6)} MB`,
  );
}

/** A result function that really solves each reading on the exact catenary (as the app would). */
function solvingResult(context: ReadingContext): ReadingResult {
  const { span, wire, section, reading } = context;
  if (!section) return { error: 'no section' };
  const rise =
    span.farAttachmentElevation + wire.farOffset - (span.nearAttachmentElevation + wire.nearOffset);
  try {
    const solution = solveSpan({ span: span.length, rise }, section.conductor.weight, reading.measurement);
    return { horizontalTension: solution.horizontalTension, sag: solution.midspanSag };
  } catch (error) {
    return { error: error instanceof SpanInputError ? error.code : 'failed' };
  }
}

console.log(
  `machine: load average ${os.loadavg()[0]?.toFixed(1)} on ${os.cpus().length} CPUs (wall times suffer under load)`,
);
const built = performance.now();
const records = fixtureLine({ spans: SPANS });
const input = fixtureLogInput(records);
const solving: InspectionLogInput = { ...input, resultFor: solvingResult };
console.log(
  `line: ${records.span.length} spans, ${records.structure.length} structures, ${records.wire.length} wires, ` +
    `${records.reading.length} readings (built in ${(performance.now() - built).toFixed(0)} ms)`,
);
time('baseline: JSON.stringify(all records)', () => JSON.stringify(records));
time('CSV inspection log (given results)', () => joinExportJob(inspectionLogJob(input)));
time('CSV inspection log (solving every reading)', () => joinExportJob(inspectionLogJob(solving)));
time('JSON backup', () => joinExportJob(backupJsonJob(records, '2026-05-15T09:00:00.000Z')));
const backupText = joinExportJob(backupJsonJob(records, '2026-05-15T09:00:00.000Z'));
time('JSON backup parse + validate (import)', () => {
  const parsed = parseBackup(backupText);
  if (!parsed.ok) throw new Error(parsed.problem.message);
  return backupText.length;
});
time('GeoJSON', () => JSON.stringify(lineGeoJson(input)));
