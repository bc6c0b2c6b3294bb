// Every main screen at phone (360×780) and desktop (1280×800) size, with the demo line loaded: screenshots go to
// tests/artifacts/ (ignored by git) for a person to look at, and two rules are checked on each screen:
// nothing is wider than the phone screen, and every button is at least 48 px tall (common practice for touch
// targets; gloved hands need more, not less).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { acceptCautions, DESKTOP, openBrowser, PHONE, screenshot, serveDist, type Served } from './harness';

const MIN_TARGET_PX = 48;

let served: Served;

beforeAll(async () => {
  served = await serveDist();
});

afterAll(async () => {
  await served?.stop();
});

async function checkLayout(page: Page, name: string): Promise<void> {
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
  expect(overflow, `${name}: page wider than the screen by ${overflow}px`).toBeLessThanOrEqual(0);
  const small = await page.evaluate((minimum) => {
    return [...document.querySelectorAll<HTMLElement>('main .btn, main button, main .method-choice')]
      .filter((element) => element.offsetParent !== null)
      .map((element) => ({
        text: element.textContent?.trim().slice(0, 40) ?? '',
        height: element.getBoundingClientRect().height,
      }))
      .filter((item) => item.height < minimum);
  }, MIN_TARGET_PX);
  expect(small, `${name}: buttons under ${MIN_TARGET_PX}px`).toEqual([]);
}

async function shoot(page: Page, size: string, name: string): Promise<void> {
  await page.evaluate(() => window.scrollTo(0, 0));
  await page.waitForTimeout(250);
  await checkLayout(page, `${size}/${name}`);
  await screenshot(page, `${size}-${name}`);
}

for (const [size, viewport] of [
  ['phone', PHONE],
  ['desktop', DESKTOP],
] as const) {
  describe(`main screens at ${size} size`, () => {
    it('welcome, lines, line, section, span, reading forms, results, settings and conductors', async () => {
      const browser = await openBrowser(viewport);
      const page = browser.page;
      try {
        await page.goto(served.url);
        await expect
          .poll(() => page.getByRole('heading', { name: 'Before you measure' }).isVisible())
          .toBe(true);
        await shoot(page, size, '01-welcome');
        await acceptCautions(page);
        await shoot(page, size, '02-lines-empty');
        await page.getByRole('button', { name: 'Try a demo line' }).click();
        await page.waitForURL(/#\/line\/[^/]+$/);
        const lineUrl = page.url();
        await expect.poll(() => page.locator('.span-card').count()).toBe(12);
        await shoot(page, size, '03-line');

        await page.getByRole('link', { name: 'Edit section' }).first().click();
        await expect.poll(() => page.getByLabel('Section name').isVisible()).toBe(true);
        await shoot(page, size, '04-section');

        await page.goto(lineUrl);
        await page.getByRole('link', { name: /Span 8 → 9/ }).click();
        await expect.poll(() => page.getByRole('heading', { name: 'Span 8 → 9' }).isVisible()).toBe(true);
        const spanUrl = page.url();
        await shoot(page, size, '05-span');

        await page.locator('.reading-link').first().click();
        await expect.poll(() => page.getByTestId('result-tension').isVisible()).toBe(true);
        expect(
          await page.locator('.profile-panel svg').count(),
          'span drawing on the result',
        ).toBeGreaterThan(0);
        await shoot(page, size, '06-result-sight-line-steep');

        await page.goto(spanUrl);
        await page.getByRole('link', { name: 'New reading' }).click();
        await expect.poll(() => page.locator('[data-method]').count()).toBe(6);
        await shoot(page, size, '07-reading-methods');
        await page.locator('[data-method="midspan-sag"]').click();
        await page.getByLabel('Sag at midspan').fill('9.8');
        await page.getByLabel('Conductor temperature').fill('24');
        await expect.poll(() => page.getByTestId('preview-tension').isVisible()).toBe(true);
        await shoot(page, size, '08-reading-midspan');
        await page.getByRole('button', { name: 'Change method' }).click();
        await page.locator('[data-method="return-wave"]').click();
        await shoot(page, size, '09-reading-return-wave');
        await page.getByRole('button', { name: 'Change method' }).click();
        await page.locator('[data-method="surveyed-points"]').click();
        await shoot(page, size, '10-reading-surveyed-points');

        await page.goto(lineUrl);
        await page.getByRole('link', { name: /Span 7 → 8/ }).click();
        await page.locator('.reading-link').first().click();
        await expect.poll(() => page.getByTestId('result-tension').isVisible()).toBe(true);
        await shoot(page, size, '11-result-surveyed-points');

        await page.goto(lineUrl);
        await page.getByRole('link', { name: 'Line settings and units' }).click();
        await shoot(page, size, '12-line-settings');
        await page.getByRole('link', { name: 'Conductors' }).click();
        await shoot(page, size, '13-conductors');
        await page.goto(served.url);
        await shoot(page, size, '14-lines');
      } finally {
        await browser.close();
      }
    });
  });
}
