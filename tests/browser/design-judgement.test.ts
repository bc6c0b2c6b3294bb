// End-to-end (issue 4): a crew enters a section's design basis, takes a reading that hangs 0.5 m below the design
// sag, and sees "Too slack" with its reason on the result screen and on the line.
// Check values come from core itself (assessReading on the same inputs): the app must show what core judges.
// Needs the judgement screens wired in (DesignBasisForm on the section screen, ReadingJudgement on the result).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { assessReading } from '../../core/assess/assess-reading';
import type { SectionDesignInput } from '../../core/assess/types';
import { findConductor } from '../../core/conductors';
import { formatQuantity } from '../../core/units';
import { acceptCautions, openBrowser, serveDist, type Browser, type Served } from './harness';

const raven = findConductor('raven');
if (!raven) throw new Error('The conductor library has no Raven entry.');
const GEOMETRY = { span: 120, rise: 3.5 };
/** Design: 5 kN horizontal tension at 15.6 °C as strung, no creep allowance, hottest 49 °C (entered values). */
const SECTION: SectionDesignInput = {
  conductor: {
    weight: raven.weight,
    ratedStrength: raven.ratedStrength,
    area: raven.area,
    modulus: raven.modulus,
    expansion: raven.expansion,
    diameter: raven.diameter,
    ...(raven.composite ? { composite: raven.composite } : {}),
  },
  basis: {
    kind: 'tension',
    horizontalTension: 5000,
    referenceTemperature: 15.6,
    state: 'initial',
    creepOffset: 0,
  },
  spanLengths: [GEOMETRY.span],
  maxDesignTemperature: 49,
  terrainCategory: 3,
};
const READING_TEMPERATURE = 21;

let served: Served;
let browser: Browser;
let page: Page;

beforeAll(async () => {
  served = await serveDist();
  browser = await openBrowser();
  page = browser.page;
});

afterAll(async () => {
  await browser?.close();
  await served?.stop();
});

describe('design judgement in the app', () => {
  it('enters a design basis, takes a too-slack reading and shows the verdict with its reason', async () => {
    await page.goto(served.url);
    await acceptCautions(page);
    await page.getByRole('button', { name: '+ New line' }).click();
    await page.getByLabel('Line name').fill('Judgement feeder');
    await page.getByRole('button', { name: 'Create line' }).click();
    await page.waitForURL(/#\/line\/[^/]+$/);
    const lineUrl = page.url();
    await page.getByRole('link', { name: '+ Add tension section' }).click();
    await page.getByLabel('Section name').fill('Str 1 to 2');
    await page.getByLabel(/^Raven /).check();
    await page.getByRole('button', { name: 'Save section and add its first span' }).click();
    await page.getByLabel('Near structure (number or name)').fill('1');
    await page.getByLabel('Far structure (number or name)').fill('2');
    await page.getByLabel('Span length').fill('120');
    await page.getByLabel('Near attachment elevation').fill('100');
    await page.getByLabel('Far attachment elevation').fill('103.5');
    await page.getByRole('button', { name: 'Save span and continue' }).click();
    await page.waitForURL(/#\/line\/[^/]+\/span\/(?!new)[^/?]+$/);
    const spanUrl = page.url();

    // The design basis, typed in the line's (metric) units.
    await page.goto(lineUrl);
    await page.getByRole('link', { name: 'Edit section' }).click();
    await page.getByLabel('Design horizontal tension').fill('5');
    await page.getByLabel('at conductor temperature').fill('15.6');
    await page.getByLabel('Creep allowance (equivalent temperature rise)').fill('0');
    await page.getByLabel('Maximum design temperature of the conductor').fill('hot');
    await page.getByRole('button', { name: 'Save design basis' }).click();
    await expect
      .poll(() => page.locator('#design-maxDesignTemperature-message').textContent())
      .toBe('"hot" is not a number.');
    await page.getByLabel('Maximum design temperature of the conductor').fill('49');
    await page.getByRole('button', { name: 'Save design basis' }).click();
    await expect.poll(() => page.getByRole('status').textContent()).toContain('Design basis saved');

    // A midspan sag 0.5 m below the design sag at the reading's temperature (design sag from core).
    const probe = assessReading(SECTION, {
      geometry: GEOMETRY,
      measurement: { method: 'midspan-sag', sag: 1 },
      conductorTemperature: READING_TEMPERATURE,
    });
    const typed = (probe.design.midspanSag + 0.5).toFixed(2);
    const expected = assessReading(SECTION, {
      geometry: GEOMETRY,
      measurement: { method: 'midspan-sag', sag: Number(typed) },
      conductorTemperature: READING_TEMPERATURE,
    });
    expect(expected.verdict.verdict).toBe('too-slack');
    await page.goto(spanUrl);
    await page.getByRole('link', { name: 'New reading' }).click();
    await page.locator('[data-method="midspan-sag"]').click();
    await page.getByLabel('Sag at midspan').fill(typed);
    await page.getByLabel('Conductor temperature').fill(String(READING_TEMPERATURE));
    await page.getByRole('button', { name: 'Save reading' }).click();
    await page.waitForURL(/#\/line\/[^/]+\/reading\/[^/]+$/);

    const panel = page.locator('.verdict-panel').first();
    await expect.poll(() => panel.locator('.verdict-badge').getAttribute('data-verdict')).toBe('too-slack');
    expect(await panel.locator('.verdict-badge').textContent()).toBe('Too slack');
    const deviation = formatQuantity(expected.verdict.sagDeviation, 'sag', 'metric').value;
    const designSag = formatQuantity(expected.design.midspanSag, 'sag', 'metric').value;
    expect(await panel.getByTestId('verdict-reason').textContent()).toContain(
      `hangs ${deviation} m lower than the design sag of ${designSag} m`,
    );

    // The line shows the same verdict in its section summary.
    await page.goto(lineUrl);
    await expect
      .poll(() => page.locator('.summary-wires [data-verdict="too-slack"]').count())
      .toBeGreaterThan(0);
  });
});
