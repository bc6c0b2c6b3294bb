// A new version of the app waits until the user agrees: the page shows the update bar, keeps the half-typed
// reading, and only reloads (into the new version, with the draft restored) after "Update now".
import { appendFileSync, cpSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, expect, it } from 'vitest';
import {
  acceptCautions,
  openBrowser,
  REPO_ROOT,
  serveDist,
  waitForServiceWorker,
  type Browser,
  type Served,
} from './harness';

let served: Served;
let browser: Browser;
let copy: string;

beforeAll(async () => {
  // Serve a private copy of dist/ so that the test can publish a "new version" by changing its service worker.
  copy = mkdtempSync(join(tmpdir(), 'spanlog-dist-'));
  cpSync(join(REPO_ROOT, 'dist'), copy, { recursive: true });
  served = await serveDist(copy);
  browser = await openBrowser();
});

afterAll(async () => {
  await browser?.close();
  await served?.stop();
  rmSync(copy, { recursive: true, force: true });
});

it('offers a waiting version and reloads only after "Update now", keeping the half-typed sag', async () => {
  const page = browser.page;
  await page.goto(served.url);
  await acceptCautions(page);
  await waitForServiceWorker(page);
  await page.getByRole('button', { name: 'Try a demo line' }).click();
  await page.waitForURL(/#\/line\/[^/]+$/);
  await page.getByRole('link', { name: /Span 1 → 2/ }).click();
  await page.getByRole('link', { name: 'New reading' }).first().click();
  await page.locator('[data-method="midspan-sag"]').click();
  await page.getByLabel('Sag at midspan').fill('0.83');

  // Publish a new version: any byte change of the service worker script makes the browser install it.
  appendFileSync(join(copy, 'service-worker.js'), '\n// next version\n');
  await page.evaluate(async () => {
    const registration = await navigator.serviceWorker.getRegistration();
    await registration?.update();
  });
  await expect
    .poll(() => page.getByText('A new version of Spanlog is ready').isVisible(), { timeout: 20_000 })
    .toBe(true);
  // Nothing reloads by itself: the typed value is still in the field a while later.
  await page.waitForTimeout(1000);
  expect(await page.getByLabel('Sag at midspan').inputValue()).toBe('0.83');

  await page.getByRole('button', { name: 'Later' }).click();
  expect(await page.getByText('A new version of Spanlog is ready').isVisible()).toBe(false);
  await page.reload();
  await expect
    .poll(() => page.getByText('A new version of Spanlog is ready').isVisible(), { timeout: 20_000 })
    .toBe(true);
  await page.getByLabel('Sag at midspan').fill('0.84');
  const reloaded = page.waitForEvent('load');
  await page.getByRole('button', { name: 'Update now' }).click();
  await reloaded;
  await expect.poll(() => page.getByLabel('Sag at midspan').inputValue()).toBe('0.84');
  expect(await page.getByText('A new version of Spanlog is ready').isVisible()).toBe(false);
});
