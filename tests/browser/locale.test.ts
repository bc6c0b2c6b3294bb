// A phone set to German: "0,83" is typed with the comma decimal separator, and figures come back with commas.
// Check value: core solveSpan on the demo's span 1 → 2 (86 m, rise 1.2 m from its structure heights, Raven).
import { afterAll, beforeAll, expect, it } from 'vitest';
import { findConductor } from '../../core/conductors';
import { solveSpan } from '../../core/solve';
import { formatQuantity } from '../../core/units';
import { acceptCautions, openBrowser, serveDist, type Browser, type Served } from './harness';

let served: Served;
let browser: Browser;

beforeAll(async () => {
  served = await serveDist();
  browser = await openBrowser(undefined, 'de-DE');
});

afterAll(async () => {
  await browser?.close();
  await served?.stop();
});

it('accepts the locale decimal comma and shows results with it', async () => {
  const raven = findConductor('raven');
  if (!raven) throw new Error('The conductor library has no Raven entry.');
  const page = browser.page;
  await page.goto(served.url);
  await acceptCautions(page);
  await page.getByRole('button', { name: 'Try a demo line' }).click();
  await page.waitForURL(/#\/line\/[^/]+$/);
  await page.getByRole('link', { name: /Span 1 → 2/ }).click();
  await page.getByRole('link', { name: 'New reading' }).first().click();
  await page.locator('[data-method="midspan-sag"]').click();
  await page.getByLabel('Sag at midspan').fill('0,83');
  // Demo span 1 → 2: structures 1 (ground 412.0 m + 11.0 m) and 2 (413.5 m + 10.7 m), 86 m apart.
  const expected = solveSpan({ span: 86, rise: 424.2 - 423 }, raven.weight, {
    method: 'midspan-sag',
    sag: 0.83,
  });
  const { value, unit } = formatQuantity(expected.horizontalTension, 'tension', 'metric', {
    locale: 'de-DE',
  });
  expect(value).toContain(',');
  await expect.poll(() => page.getByTestId('preview-tension').textContent()).toBe(`${value} ${unit}`);
  expect(await page.locator('.field__message').count()).toBe(0);
});
