// Bundled into a page by tests/bench/exports-chromium.ts: builds the 5 000-span line in the browser and times
// the CSV log (solving every reading) and the JSON backup there, so the figure is Chromium's own, not Node's.
import { backupJsonJob, inspectionLogJob, joinExportJob, readingResultFunction } from '../../../core';
import { fixtureLine, fixtureLogInput } from '../../core/exports/line-fixture';

export interface ChromiumExportTimes {
  spans: number;
  readings: number;
  csvMs: number[];
  jsonMs: number[];
  csvBytes: number;
  jsonBytes: number;
}

export function runExportBench(spans: number, runs: number): ChromiumExportTimes {
  const records = fixtureLine({ spans });
  // Results computed as the app computes them: every reading solved (and judged where a design exists).
  const bare = fixtureLogInput(records, false);
  const input = { ...bare, resultFor: readingResultFunction(bare) };
  const csvMs: number[] = [];
  const jsonMs: number[] = [];
  let csv = '';
  let json = '';
  joinExportJob(inspectionLogJob(input)); // warm-up
  for (let run = 0; run < runs; run += 1) {
    let start = performance.now();
    csv = joinExportJob(inspectionLogJob(input));
    csvMs.push(performance.now() - start);
    start = performance.now();
    json = joinExportJob(backupJsonJob(records, '2026-05-15T09:00:00.000Z'));
    jsonMs.push(performance.now() - start);
  }
  const encoder = new TextEncoder();
  return {
    spans: records.span.length,
    readings: records.reading.length,
    csvMs,
    jsonMs,
    csvBytes: encoder.encode(csv).length,
    jsonBytes: encoder.encode(json).length,
  };
}
