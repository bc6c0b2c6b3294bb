// Exports through the app's own buttons: the demo line is loaded and given a reading whose note looks like a
// spreadsheet formula, then every file is downloaded the way a user would and read with outside tools:
// papaparse for the CSV (RFC 4180), core parseBackup for the JSON backup (its zod schemas), and
// @placemarkio/check-geojson for RFC 7946. The backup is restored into a fresh browser profile through the UI
// (twice: the second time changes nothing), a span list is previewed and imported, and the printable report is
// rendered for print at phone and desktop sizes (screenshots and a PDF in tests/artifacts, looked at by a person).
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { check } from '@placemarkio/check-geojson';
import Papa from 'papaparse';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { writeBackupJson } from '../../core/exports';
import { parseBackup } from '../../core/imports';
import { fixtureLine } from '../core/exports/line-fixture';
import { buildDemoLine } from '../../web/demo/demo-line';
import {
  ARTIFACTS,
  DESKTOP,
  PHONE,
  acceptCautions,
  openBrowser,
  serveDist,
  type Browser,
  type Served,
} from './harness';

// A note a spreadsheet would run as a formula (OWASP "CSV Injection" example shape) unless neutralised.
const FORMULA_NOTE = '=HYPERLINK("http://example.invalid","click")';
// The demo line as the app builds it (same function, so the same counts): 2 sections, 13 structures, 12 spans.
const DEMO = buildDemoLine({ now: new Date(), newId: () => crypto.randomUUID(), deviceId: 'test' }).records;
const DEMO_READINGS = DEMO.reading.filter((reading) => !reading.deleted).length;

/** The part of a checked GeoJSON object this test reads (the checker's own types need @types/geojson). */
interface CheckedCollection {
  type: string;
  features: { geometry: { type: string } | null }[];
}

let served: Served;
let browser: Browser;
let page: Page;
let lineUrl = '';
let backupPath = '';
const downloads = mkdtempSync(join(tmpdir(), 'spanlog-downloads-'));

/** Clicks `button` and saves what it downloads; returns the saved path and the browser's suggested name. */
async function download(target: Page, name: string | RegExp): Promise<{ path: string; fileName: string }> {
  const [file] = await Promise.all([
    target.waitForEvent('download'),
    target.getByRole('button', { name }).click(),
  ]);
  const fileName = file.suggestedFilename();
  const path = join(downloads, `${Date.now()}-${fileName}`);
  await file.saveAs(path);
  return { path, fileName };
}

function parseCsv(text: string): Papa.ParseResult<Record<string, string>> {
  return Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true });
}

beforeAll(async () => {
  served = await serveDist();
  browser = await openBrowser(DESKTOP);
  page = browser.page;
});

afterAll(async () => {
  await browser?.close();
  await served?.stop();
  rmSync(downloads, { recursive: true, force: true });
});

describe('exports and imports through the UI', () => {
  it('loads the demo line and adds a reading with a formula-like note', async () => {
    await page.goto(served.url);
    await acceptCautions(page);
    await page.getByRole('button', { name: 'Try a demo line' }).click();
    await page.waitForURL(/#\/line\/[^/]+$/);
    lineUrl = page.url();
    await expect.poll(() => page.locator('.span-card').count()).toBe(12);
    await page.getByRole('link', { name: /Span 8 → 9/ }).click();
    await page.getByRole('link', { name: 'New reading' }).click();
    await page.locator('[data-method="midspan-sag"]').click();
    await page.getByLabel('Sag at midspan').fill('2.1');
    await page.getByLabel('Conductor temperature').fill('20');
    await page.getByLabel('Notes').fill(FORMULA_NOTE);
    await page.getByRole('button', { name: 'Save reading' }).click();
    await page.waitForURL(/#\/line\/[^/]+\/reading\/[^/]+$/);
    await page.goto(lineUrl);
    await expect
      .poll(() => page.getByRole('heading', { name: 'Report, files and backups' }).isVisible())
      .toBe(true);
  });

  it('inspection log CSV: one row per live reading, units in the header, formula text neutralised', async () => {
    const { path, fileName } = await download(page, 'Inspection log (CSV)');
    expect(fileName).toMatch(/^Kestrel Ridge 12\.47 kV feeder-inspection-log-\d{4}-\d{2}-\d{2}\.csv$/);
    const text = readFileSync(path, 'utf8');
    const parsed = parseCsv(text);
    expect(parsed.errors).toEqual([]);
    // The demo line is metric (m, kN, °C per the SPEC's unit systems).
    for (const column of [
      'Line',
      'Span',
      'Method',
      'Readings',
      'Conductor temperature (°C)',
      'Horizontal tension (kN)',
      'Sag (m)',
      'Design sag (m)',
      'Sag deviation (m)',
      'Rated strength used (%)',
      'Verdict',
      'Notes',
    ]) {
      expect(parsed.meta.fields, `column ${column}`).toContain(column);
    }
    expect(parsed.data).toHaveLength(DEMO_READINGS + 1);
    expect(new Set(parsed.data.map((row) => row['Reading id'])).size).toBe(DEMO_READINGS + 1);
    const noted = parsed.data.filter((row) => row.Notes?.includes('HYPERLINK'));
    expect(noted).toHaveLength(1);
    // Neutralised: a leading apostrophe, so a spreadsheet shows text (OWASP CSV Injection guidance).
    expect(noted[0]?.Notes).toBe(`'${FORMULA_NOTE}`);
    expect(noted[0]?.['Sag (m)']).toBe('2.100');
    // No cell of the file starts a formula.
    for (const row of parsed.data)
      for (const [column, cell] of Object.entries(row))
        if (!column.includes('(')) expect(cell, `${column}`).not.toMatch(/^[=+@\t\r]/);
  });

  it('JSON backup parses with the zod schemas and holds every record of the line', async () => {
    const { path, fileName } = await download(page, 'Backup of this line (JSON)');
    expect(fileName).toMatch(/-backup-\d{4}-\d{2}-\d{2}\.json$/);
    backupPath = path;
    const parsed = parseBackup(readFileSync(path, 'utf8'));
    if (!parsed.ok) throw new Error(`Backup did not parse: ${parsed.problem.message}`);
    expect(parsed.records.line).toHaveLength(1);
    expect(parsed.records.section).toHaveLength(DEMO.section.length);
    expect(parsed.records.structure).toHaveLength(DEMO.structure.length);
    expect(parsed.records.span).toHaveLength(12);
    expect(parsed.records.reading).toHaveLength(DEMO_READINGS + 1);
  });

  it('the backup restores into a fresh profile through the UI, and a second restore changes nothing', async () => {
    const fresh = await openBrowser(PHONE);
    try {
      const other = fresh.page;
      await other.goto(served.url);
      await acceptCautions(other);
      await expect.poll(() => other.getByText('No lines on this phone yet').isVisible()).toBe(true);
      const restore = other.getByLabel('Restore from a backup (JSON)');
      await restore.setInputFiles(backupPath);
      await expect
        .poll(() => other.getByRole('status').textContent())
        .toMatch(/Backup restored: \d+ records/);
      const first = (await other.getByRole('status').textContent()) ?? '';
      const total =
        1 + DEMO.section.length + DEMO.structure.length + 12 + DEMO.wire.length + DEMO_READINGS + 1;
      expect(first).toContain(`${total} records added or updated, 0 already up to date`);
      await expect.poll(() => other.locator('.line-card').count()).toBe(1);

      await restore.setInputFiles(backupPath);
      await expect
        .poll(() => other.getByRole('status').textContent())
        .toContain(`0 records added or updated, ${total} already up to date`);
      expect(await other.locator('.line-card').count()).toBe(1);

      // Everything CSV from the lines screen of the restored profile: the same readings.
      const { path } = await download(other, 'Inspection log of all lines (CSV)');
      const parsed = parseCsv(readFileSync(path, 'utf8'));
      expect(parsed.errors).toEqual([]);
      expect(parsed.data).toHaveLength(DEMO_READINGS + 1);
      const all = await download(other, 'Backup of all lines (JSON)');
      const backup = parseBackup(readFileSync(all.path, 'utf8'));
      expect(backup.ok && backup.records.span.length).toBe(12);

      await other.locator('.line-card').click();
      await expect.poll(() => other.locator('.span-card').count()).toBe(12);
    } finally {
      await fresh.close();
    }
  });

  it('GeoJSON passes an RFC 7946 checker: structures as points, spans as lines', async () => {
    await page.goto(lineUrl);
    const { path, fileName } = await download(page, 'Map (GeoJSON)');
    expect(fileName).toMatch(/\.geojson$/);
    // check() throws a list of problems when the text breaks RFC 7946; it returns the parsed object otherwise.
    const geojson = check(readFileSync(path, 'utf8')) as unknown as CheckedCollection;
    expect(geojson.type).toBe('FeatureCollection');
    const types = geojson.features.map((feature) => feature.geometry?.type);
    expect(types.filter((type) => type === 'Point')).toHaveLength(DEMO.structure.length);
    expect(types.filter((type) => type === 'LineString')).toHaveLength(12);
  });

  it('the span-list template downloads, and a small span list imports through the preview', async () => {
    const template = await download(page, 'Span-list template');
    const parsedTemplate = parseCsv(readFileSync(template.path, 'utf8'));
    expect(parsedTemplate.meta.fields).toContain('span_length (m)');
    expect(parsedTemplate.data.length).toBeGreaterThan(0);

    const header =
      'structure,ground_elevation (m),attachment_height (m),span_length (m),section,conductor,wires';
    const chooseSpanList = (rows: string[]) =>
      page.getByLabel('Add structures from a span list (CSV)').setInputFiles({
        name: 'quarry-tap.csv',
        mimeType: 'text/csv',
        buffer: Buffer.from([header, ...rows].join('\r\n'), 'utf8'),
      });
    // First a file with the section on the first row (where no span is described): the preview names the rows
    // at fault and adds nothing.
    await chooseSpanList([
      'T1,210,11,,Tap to the quarry,raven,A',
      'T2,212.5,11,95.5,,,A',
      'T3,209,11,102,,,A',
    ]);
    await expect.poll(() => page.getByRole('heading', { name: 'Span-list preview' }).isVisible()).toBe(true);
    expect(await page.locator('.export-panel__bad-row').count()).toBeGreaterThan(0);
    expect(await page.getByRole('button', { name: 'Add to this line' }).count()).toBe(0);
    await page.getByRole('button', { name: 'Close preview' }).click();

    await chooseSpanList([
      'T1,210,11,,,,',
      'T2,212.5,11,95.5,Tap to the quarry,raven,A',
      'T3,209,11,102,,,A',
    ]);
    await expect.poll(() => page.getByRole('heading', { name: 'Span-list preview' }).isVisible()).toBe(true);
    expect(await page.locator('.export-panel__preview tbody tr').count()).toBe(3);
    expect(
      await page.locator('.export-panel__bad-row').count(),
      await page.locator('.export-panel__preview').innerText(),
    ).toBe(0);
    await page.getByRole('button', { name: 'Add to this line' }).click();
    await expect.poll(() => page.getByRole('status').textContent()).toMatch(/Added \d+ records/);
    // The screen reloads: two more spans, in a new section.
    await expect.poll(() => page.locator('.span-card').count()).toBe(14);
    expect(await page.getByRole('heading', { name: 'Tap to the quarry' }).isVisible()).toBe(true);
  });

  it('the printable report renders for print; screenshots and a PDF are saved for a person to look at', async () => {
    await page.goto(lineUrl);
    await page.getByRole('button', { name: 'Printable report' }).click();
    await page.waitForURL(/#\/line\/[^/]+\/report$/);
    await expect
      .poll(() => page.getByRole('heading', { name: /Sag inspection report: Kestrel Ridge/ }).isVisible())
      .toBe(true);
    expect(await page.getByRole('button', { name: 'Print / save as PDF' }).isVisible()).toBe(true);
    expect(await page.getByRole('link', { name: /Kestrel Ridge/ }).isVisible()).toBe(true);
    // The note is shown as text, never run as markup.
    expect(await page.locator('.print-report__notes', { hasText: FORMULA_NOTE }).count()).toBe(1);
    mkdirSync(ARTIFACTS, { recursive: true });
    // On a phone screen the wide tables scroll inside their own box; the page itself never scrolls sideways.
    await page.setViewportSize(PHONE);
    await page.screenshot({ path: join(ARTIFACTS, 'report-phone-screen.png'), fullPage: true });
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);
    await page.emulateMedia({ media: 'print' });
    expect(await page.getByRole('button', { name: 'Print / save as PDF' }).isVisible()).toBe(false);
    for (const [size, viewport] of [
      ['phone', PHONE],
      ['desktop', DESKTOP],
    ] as const) {
      await page.setViewportSize(viewport);
      await page.screenshot({ path: join(ARTIFACTS, `report-${size}.png`), fullPage: true });
    }
    const pdf = join(ARTIFACTS, 'report.pdf');
    await page.pdf({ path: pdf, format: 'A4', printBackground: true });
    expect(readFileSync(pdf).subarray(0, 5).toString()).toBe('%PDF-');
    execFileSync('pdftoppm', ['-png', '-r', '60', pdf, join(ARTIFACTS, 'report-pdf')]);
    await page.emulateMedia({ media: 'screen' });
    await page.setViewportSize(DESKTOP);
  });

  it('a large line exports without freezing the screen', async () => {
    // 2 000 spans with one reading each (the bench uses 5 000 outside the UI): restored through the UI,
    // then the inspection log is built while a probe in the page measures the longest stretch the main thread
    // was busy (Long Tasks API). 200 ms is where a tap starts to feel ignored (common practice for
    // responsiveness budgets: under 100 ms feels instant, over 200 ms reads as a stall).
    const records = fixtureLine({ spans: 2000 });
    const bigBackup = join(downloads, 'big-line.json');
    writeFileSync(bigBackup, writeBackupJson(records, '2026-05-15T09:00:00.000Z'));
    await page.goto(served.url);
    await page.getByLabel('Restore from a backup (JSON)').setInputFiles(bigBackup);
    await expect
      .poll(() => page.getByRole('status').textContent(), { timeout: 60_000 })
      .toMatch(/Backup restored/);
    const bigLine = records.line[0];
    if (!bigLine) throw new Error('The fixture has no line.');
    await page.goto(`${served.url}#/line/${bigLine.id}`);
    await expect.poll(() => page.locator('.span-card').count(), { timeout: 60_000 }).toBe(2000);
    await page.evaluate(() => {
      const probe = window as unknown as { longestTask: number };
      probe.longestTask = 0;
      new PerformanceObserver((list) => {
        for (const entry of list.getEntries())
          probe.longestTask = Math.max(probe.longestTask, entry.duration);
      }).observe({ type: 'longtask' });
    });
    const started = Date.now();
    const { path } = await download(page, 'Inspection log (CSV)');
    const elapsed = Date.now() - started;
    const parsed = parseCsv(readFileSync(path, 'utf8'));
    expect(parsed.data).toHaveLength(records.reading.length);
    const longest = await page.evaluate(() => (window as unknown as { longestTask: number }).longestTask);
    console.info(
      `large line: ${records.reading.length} readings exported in ${elapsed} ms, longest task ${longest.toFixed(0)} ms`,
    );
    expect(longest).toBeLessThan(200);
  });
});
