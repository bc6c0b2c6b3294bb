// Export timings in Chromium: bundles tests/bench/browser/exports-entry.ts with Vite, loads it into a blank
// page of Debian's Chromium and prints the median CSV-log and JSON-backup times for a 5 000-span line.
// Goal (issue 5): each under 1 s. Run: npx tsx tests/bench/exports-chromium.ts
import { fileURLToPath } from 'node:url';
import { build, type Rolldown } from 'vite';
import { DESKTOP, openBrowser } from '../browser/harness';
import type { ChromiumExportTimes } from './browser/exports-entry';

const SPANS = 5_000;
const RUNS = 5;
const entry = fileURLToPath(new URL('./browser/exports-entry.ts', import.meta.url));

async function bundle(): Promise<string> {
  const output = await build({
    configFile: false,
    logLevel: 'silent',
    build: {
      write: false,
      minify: true,
      lib: { entry, formats: ['iife'], name: 'SpanlogExportBench', fileName: 'bench' },
    },
  });
  const results = (Array.isArray(output) ? output : [output]) as Rolldown.RolldownOutput[];
  const chunk = results.flatMap((result) => result.output).find((item) => item.type === 'chunk');
  if (!chunk || chunk.type !== 'chunk') throw new Error('The bench bundle produced no script.');
  return chunk.code;
}

const median = (values: number[]): number =>
  [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;

const script = await bundle();
const browser = await openBrowser(DESKTOP);
try {
  await browser.page.setContent('<!doctype html><title>export bench</title>');
  await browser.page.addScriptTag({ content: script });
  const times = await browser.page.evaluate(
    ([spans, runs]) =>
      (
        globalThis as unknown as {
          SpanlogExportBench: { runExportBench: (s: number, r: number) => ChromiumExportTimes };
        }
      ).SpanlogExportBench.runExportBench(spans, runs),
    [SPANS, RUNS] as const,
  );
  const verdict = (ms: number): string => (ms < 1000 ? 'under 1 s: met' : 'over 1 s: MISSED');
  console.log(
    `Chromium export of ${times.spans} spans, ${times.readings} readings (median of ${RUNS} runs):`,
  );
  console.log(
    `  CSV log (solving)   ${median(times.csvMs).toFixed(0).padStart(5)} ms  ${(times.csvBytes / 1e6).toFixed(2)} MB  ${verdict(median(times.csvMs))}`,
  );
  console.log(
    `  JSON backup         ${median(times.jsonMs).toFixed(0).padStart(5)} ms  ${(times.jsonBytes / 1e6).toFixed(2)} MB  ${verdict(median(times.jsonMs))}`,
  );
} finally {
  await browser.close();
}
