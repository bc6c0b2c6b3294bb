// End-to-end: a crew member creates a line, a span and two readings (midspan sag typed, return wave tapped), sees
// the tension the core solver gives, switches units, goes offline, reloads, and finds everything still there.
// Check values come from the core solver itself (solveSpan on the same inputs) and from core/units formatting:
// the app must show exactly what core computes, rounded the way the app rounds.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { findConductor } from '../../core/conductors';
import { solveSpan } from '../../core/solve';
import { formatQuantity, METRES_PER_FOOT } from '../../core/units';
import { expectClose } from '../helpers/expect-close';
import {
  acceptCautions,
  openBrowser,
  serveDist,
  waitForServiceWorker,
  type Browser,
  type Served,
} from './harness';

const LOCALE = 'en-US';
const raven = findConductor('raven');
if (!raven) throw new Error('The conductor library has no Raven entry.');
const GEOMETRY = { span: 120, rise: 3.5 };

let served: Served;
let browser: Browser;
let page: Page;

function shown(valueSI: number, kind: 'tension' | 'sag' | 'length', system: 'metric' | 'us'): string {
  const { value, unit } = formatQuantity(valueSI, kind, system, { locale: LOCALE });
  return `${value} ${unit}`;
}

async function resultTension(): Promise<string> {
  return (await page.getByTestId('result-tension').textContent())?.trim() ?? '';
}

/** The unrounded SI tension the result screen holds (data-value-si), N. */
async function resultTensionSI(): Promise<number> {
  return Number(await page.getByTestId('result-tension').getAttribute('data-value-si'));
}

beforeAll(async () => {
  served = await serveDist();
  browser = await openBrowser();
  page = browser.page;
});

afterAll(async () => {
  await browser?.close();
  await served?.stop();
});

describe('field app, online then offline', () => {
  let lineUrl = '';
  let spanUrl = '';
  let midspanResultUrl = '';
  let returnWaveTension = Number.NaN;

  it('opens, shows the first-run cautions once, and gets a controlling service worker', async () => {
    await page.goto(served.url);
    await expect.poll(() => page.getByRole('heading', { name: 'Before you measure' }).isVisible()).toBe(true);
    await acceptCautions(page);
    await waitForServiceWorker(page);
    await page.reload();
    await expect.poll(() => page.getByRole('heading', { name: 'Lines' }).isVisible()).toBe(true);
  });

  it('creates a line, a tension section with a library conductor, and a span', async () => {
    await page.getByRole('button', { name: '+ New line' }).click();
    await page.getByLabel('Line name').fill('Test feeder 7');
    await page.getByRole('button', { name: 'Create line' }).click();
    await page.waitForURL(/#\/line\/[^/]+$/);
    lineUrl = page.url();
    await page.getByRole('link', { name: '+ Add tension section' }).click();
    await page.getByLabel('Section name').fill('Str 1 to 2');
    await page.getByLabel(/^Raven /).check();
    await page.getByRole('button', { name: 'Save section and add its first span' }).click();
    await page.getByLabel('Near structure (number or name)').fill('1');
    await page.getByLabel('Far structure (number or name)').fill('2');
    await page.getByLabel('Span length').fill('120');
    await page.getByLabel('Near attachment elevation').fill('100');
    await page.getByLabel('Far attachment elevation').fill('103.5');
    await expect.poll(() => page.locator('.rise').textContent()).toContain('3.50 m');
    await page.getByRole('button', { name: 'Save span and continue' }).click();
    await page.waitForURL(/#\/line\/[^/]+\/span\/(?!new)[^/?]+$/);
    spanUrl = page.url();
    await expect.poll(() => page.getByRole('heading', { name: 'Span 1 → 2' }).isVisible()).toBe(true);
  });

  it('a midspan-sag reading shows the tension core solveSpan gives', async () => {
    await page.getByRole('link', { name: 'New reading' }).click();
    await page.locator('[data-method="midspan-sag"]').click();
    await page.getByLabel('Sag at midspan').fill('2.35');
    await page.getByLabel('Conductor temperature').fill('21');
    // Source of the check value: core solveSpan on the same inputs (the app must not solve differently).
    const expected = solveSpan(GEOMETRY, raven.weight, {
      method: 'midspan-sag',
      sag: 2.35,
    }).horizontalTension;
    await expect
      .poll(() => page.getByTestId('preview-tension').textContent())
      .toBe(shown(expected, 'tension', 'metric'));
    await page.getByRole('button', { name: 'Save reading' }).click();
    await page.waitForURL(/#\/line\/[^/]+\/reading\/[^/]+$/);
    midspanResultUrl = page.url();
    expect(await resultTension()).toBe(shown(expected, 'tension', 'metric'));
    // Shown to 0.01 kN: within half of that of the solver's value.
    expectClose(
      Number.parseFloat(await resultTension()) * 1000,
      expected,
      5 / expected,
      'shown kN vs solveSpan',
    );
    // Unrounded: the same number core gives (1e-12 relative: the same code on the same inputs; a parabolic
    // shortcut would be about 0.1 % off on this span).
    expectClose(await resultTensionSI(), expected, 1e-12, 'result H vs solveSpan');
  });

  it('a return-wave reading by tapping shows the tension core gives for the tapped count and time', async () => {
    await page.goto(spanUrl);
    await page.getByRole('link', { name: 'New reading' }).click();
    await page.locator('[data-method="return-wave"]').click();
    await expect.poll(() => page.getByText('Only strike or jerk a conductor').isVisible()).toBe(true);
    const tap = page.locator('.tap-timer__tap');
    for (let index = 0; index < 4; index += 1) {
      await tap.dispatchEvent('pointerdown', { button: 0 });
      await page.waitForTimeout(650);
    }
    await expect.poll(() => page.getByTestId('return-count').textContent()).toBe('3');
    await page.getByRole('button', { name: 'Use these taps' }).click();
    const returns = Number(await page.getByLabel('Returns counted (N)').inputValue());
    const seconds = Number(await page.getByLabel('Time for N returns (T)').inputValue());
    expect(returns).toBe(3);
    expectClose(seconds, 3 * 0.65, 0.1, 'tapped time ≈ three 0.65 s intervals');
    await page.getByLabel('Conductor temperature').fill('21');
    await page.getByRole('button', { name: 'Save reading' }).click();
    await page.waitForURL(/#\/line\/[^/]+\/reading\/[^/]+$/);
    // Source: core solveSpan for the count and time the form kept.
    returnWaveTension = solveSpan(GEOMETRY, raven.weight, {
      method: 'return-wave',
      returns,
      seconds,
    }).horizontalTension;
    expect(await resultTension()).toBe(shown(returnWaveTension, 'tension', 'metric'));
    expectClose(await resultTensionSI(), returnWaveTension, 1e-12, 'return-wave H vs solveSpan');
  });

  it('US customary units show the same physical values', async () => {
    await page.goto(lineUrl);
    await page.getByRole('link', { name: 'Line settings and units' }).click();
    await page.getByLabel(/US customary/).check();
    await page.getByRole('button', { name: 'Save settings' }).click();
    await expect.poll(() => page.getByRole('status').textContent()).toContain('Saved');
    await page.goto(midspanResultUrl);
    const solved = solveSpan(GEOMETRY, raven.weight, { method: 'midspan-sag', sag: 2.35 });
    await expect.poll(resultTension).toBe(shown(solved.horizontalTension, 'tension', 'us'));
    // Same physical value underneath: switching units changes only what is shown.
    expectClose(await resultTensionSI(), solved.horizontalTension, 1e-12, 'H in SI after the switch');
    expect(await page.getByTestId('result-sag').textContent()).toBe(shown(solved.midspanSag, 'sag', 'us'));
    // 2.35 m typed in metric reads back as 2.35 / 0.3048 = 7.71 ft (exact international foot, NIST SP 811),
    // shown to 0.01 ft.
    const sagFeet = Number.parseFloat((await page.getByTestId('result-sag').textContent()) ?? '');
    expectClose(sagFeet, 2.35 / METRES_PER_FOOT, 0.005 / 7.7, 'sag in ft');
    await page.goto(spanUrl);
    expect(await page.getByLabel('Span length').inputValue()).toBe(
      formatQuantity(120, 'length', 'us', { locale: LOCALE }).value,
    );
  });

  it('offline after a reload, the app and all data are still there', async () => {
    await browser.context.setOffline(true);
    await page.reload();
    await expect.poll(() => page.getByRole('heading', { name: 'Span 1 → 2' }).isVisible()).toBe(true);
    await page.goto(midspanResultUrl);
    const expected = solveSpan(GEOMETRY, raven.weight, {
      method: 'midspan-sag',
      sag: 2.35,
    }).horizontalTension;
    await expect.poll(resultTension).toBe(shown(expected, 'tension', 'us'));
    await page.goto(served.url);
    await expect.poll(() => page.getByRole('link', { name: /Test feeder 7/ }).isVisible()).toBe(true);
    await page.goto(spanUrl);
    await expect.poll(() => page.locator('.reading-link').count()).toBe(2);
    expect(await page.locator('.reading-link').first().textContent()).toContain(
      shown(returnWaveTension, 'tension', 'us'),
    );
  });

  it('a half-typed reading survives a reload (offline too)', async () => {
    await page.goto(spanUrl);
    await page.getByRole('link', { name: 'New reading' }).click();
    await page.locator('[data-method="offset-sag"]').click();
    await page.getByLabel('Distance from the near structure').fill('40');
    await page.getByLabel('Sag at that point').fill('5,1');
    await page.getByLabel('Notes').fill('Over the farm track');
    await page.waitForTimeout(400);
    await page.reload();
    await expect.poll(() => page.getByLabel('Distance from the near structure').inputValue()).toBe('40');
    expect(await page.getByLabel('Sag at that point').inputValue()).toBe('5,1');
    expect(await page.getByLabel('Notes').inputValue()).toBe('Over the farm track');
    // en-US takes '.' only: the comma gets a message beside the field instead of a NaN.
    expect(await page.locator('.field--invalid .field__message').first().textContent()).toContain(
      'decimal point',
    );
    await browser.context.setOffline(false);
  });
});
