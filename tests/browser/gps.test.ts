// GPS capture of a structure: with permission the position shows and is kept with the span's structures; without
// it a plain message says why and how to fix it.
import { afterAll, beforeAll, expect, it } from 'vitest';
import { acceptCautions, openBrowser, serveDist, type Served } from './harness';

let served: Served;

beforeAll(async () => {
  served = await serveDist();
});

afterAll(async () => {
  await served?.stop();
});

async function openNewSpan(page: import('playwright-core').Page, url: string): Promise<void> {
  await page.goto(url);
  await acceptCautions(page);
  await page.getByRole('button', { name: 'Try a demo line' }).click();
  await page.waitForURL(/#\/line\/[^/]+$/);
  await page.getByRole('link', { name: '+ Add span' }).first().click();
  await expect.poll(() => page.getByLabel('Span length').isVisible()).toBe(true);
}

it('captures the far structure position when location is allowed', async () => {
  const browser = await openBrowser();
  try {
    // An invented spot (the demo valley), not a real site.
    await browser.context.grantPermissions(['geolocation']);
    await browser.context.setGeolocation({ latitude: 44.32051, longitude: -121.48811, accuracy: 6 });
    await openNewSpan(browser.page, served.url);
    const far = browser.page.locator('.field', { hasText: 'Far structure position' });
    await far.getByRole('button', { name: 'Capture GPS position' }).click();
    await expect.poll(() => far.textContent()).toContain('44.320510, -121.488110 (±6 m)');
  } finally {
    await browser.close();
  }
});

it('says why when location permission is refused', async () => {
  const browser = await openBrowser();
  try {
    await browser.context.clearPermissions();
    await openNewSpan(browser.page, served.url);
    const near = browser.page.locator('.field', { hasText: 'Near structure position' });
    await near.getByRole('button', { name: /Capture/ }).click();
    await expect
      .poll(() => near.getByRole('alert').textContent(), { timeout: 35_000 })
      .toMatch(/permission|position/i);
  } finally {
    await browser.close();
  }
});
