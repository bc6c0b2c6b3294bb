// Size report: the gzip size of the JavaScript a first visit downloads (index.html's module script, its
// modulepreloads and, transitively, their static imports; lazily loaded screens are not counted).
// Run after a build: `npx vite build && npx tsx tests/bench/bundle-size.ts`. Goal: ≤ 60 KB gzip (issue 3).
import { existsSync, readFileSync } from 'node:fs';
import { dirname, join, normalize } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';

const GOAL_BYTES = 60 * 1024;
const dist = normalize(join(dirname(fileURLToPath(import.meta.url)), '..', '..', 'dist'));

/** Paths (relative to dist/) that index.html loads as module scripts or preloads. */
function entryPaths(html: string): string[] {
  const found = new Set<string>();
  for (const match of html.matchAll(/<script[^>]*type="module"[^>]*src="([^"]+)"/g)) found.add(match[1]!);
  for (const match of html.matchAll(/<link[^>]*rel="modulepreload"[^>]*href="([^"]+)"/g))
    found.add(match[1]!);
  return [...found].map((path) => normalize(path.replace(/^\.?\//, '')));
}

/** Static imports of a built chunk (import … from "./x.js", import "./x.js", export … from "./x.js"); not import(). */
function staticImports(code: string): string[] {
  const paths: string[] = [];
  for (const match of code.matchAll(
    /\b(?:import|export)\s*(?:[^'"();]*?\bfrom\s*)?["'](\.{1,2}\/[^"']+\.js)["']/g,
  )) {
    paths.push(match[1]!);
  }
  return paths;
}

function collect(): { file: string; raw: number; gzip: number }[] {
  const html = readFileSync(join(dist, 'index.html'), 'utf8');
  const queue = entryPaths(html);
  const seen = new Set<string>();
  const rows: { file: string; raw: number; gzip: number }[] = [];
  while (queue.length > 0) {
    const file = queue.shift()!;
    if (seen.has(file)) continue;
    seen.add(file);
    const code = readFileSync(join(dist, file));
    rows.push({ file, raw: code.length, gzip: gzipSync(code, { level: 9 }).length });
    for (const imported of staticImports(code.toString('utf8')))
      queue.push(normalize(join(dirname(file), imported)));
  }
  return rows;
}

if (!existsSync(join(dist, 'index.html'))) {
  console.error('dist/index.html is missing: run `npx vite build` first.');
  process.exit(1);
}
const rows = collect();
const kb = (bytes: number): string => `${(bytes / 1024).toFixed(1)} KB`;
for (const row of rows)
  console.log(`  ${row.file.padEnd(44)} ${kb(row.raw).padStart(9)} raw ${kb(row.gzip).padStart(9)} gzip`);
const total = rows.reduce((sum, row) => sum + row.gzip, 0);
const verdict = total <= GOAL_BYTES ? 'within' : 'OVER';
console.log(`first-visit JavaScript: ${kb(total)} gzip (goal ≤ ${kb(GOAL_BYTES)}: ${verdict})`);
