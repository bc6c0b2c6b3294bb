// Browser test harness: builds nothing (run `npx vite build` first), serves dist/ with tests/tools/serve.mjs on a
// free port, and opens Debian's Chromium through playwright-core with a fresh profile each time.
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export const REPO_ROOT = fileURLToPath(new URL('../..', import.meta.url));
export const ARTIFACTS = join(REPO_ROOT, 'tests', 'artifacts');

const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export const PHONE = { width: 360, height: 780 };
export const DESKTOP = { width: 1280, height: 800 };

export interface Served {
  url: string;
  stop: () => Promise<void>;
}

/** Starts the static server on a free port (serving `directory`, default dist/) and resolves once it listens. */
export async function serveDist(directory = join(REPO_ROOT, 'dist')): Promise<Served> {
  if (!existsSync(join(directory, 'index.html'))) {
    throw new Error(`${directory} has no index.html: run \`npx vite build\` before the browser tests.`);
  }
  const child: ChildProcess = spawn(process.execPath, [join(REPO_ROOT, 'tests', 'tools', 'serve.mjs')], {
    env: { ...process.env, HOST: '127.0.0.1', PORT: '0', DIST_DIR: directory },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const url = await new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error('The static server did not start within 10 s.')), 10_000);
    child.stdout?.on('data', (chunk: Buffer) => {
      const found = /http:\/\/[\d.]+:\d+\//.exec(chunk.toString());
      if (found) {
        clearTimeout(timer);
        resolve(found[0]);
      }
    });
    child.once('exit', (code) => reject(new Error(`The static server exited early (code ${String(code)}).`)));
  });
  return {
    url,
    stop: () =>
      new Promise<void>((resolve) => {
        if (child.exitCode !== null) return resolve();
        child.once('exit', () => resolve());
        child.kill();
      }),
  };
}

export interface Browser {
  context: BrowserContext;
  page: Page;
  close: () => Promise<void>;
}

/** A fresh Chromium profile (empty IndexedDB, no service worker) with one page at the given viewport. */
export async function openBrowser(viewport = PHONE, locale = 'en-US'): Promise<Browser> {
  const profile = mkdtempSync(join(tmpdir(), 'spanlog-browser-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    args: CHROMIUM_ARGS,
    viewport,
    locale,
    serviceWorkers: 'allow',
  });
  const page = context.pages()[0] ?? (await context.newPage());
  const errors: string[] = [];
  page.on('pageerror', (error) => errors.push(error.message));
  return {
    context,
    page,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
      if (errors.length > 0) throw new Error(`Uncaught errors in the page: ${errors.join(' | ')}`);
    },
  };
}

/** Waits until a service worker controls the page (precache done, offline-ready). */
export async function waitForServiceWorker(page: Page): Promise<void> {
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
    if (navigator.serviceWorker.controller) return;
    await new Promise<void>((resolve) => {
      navigator.serviceWorker.addEventListener('controllerchange', () => resolve(), { once: true });
    });
  });
}

/** Accepts the first-run cautions if they are showing. */
export async function acceptCautions(page: Page): Promise<void> {
  // The shell renders once storage is open; wait for it before deciding whether the notice is showing.
  await page.waitForSelector('main#main > *');
  const button = page.getByRole('button', { name: 'I understand: start' });
  if (await button.isVisible()) await button.click();
}

export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(ARTIFACTS, { recursive: true });
  const path = join(ARTIFACTS, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}
