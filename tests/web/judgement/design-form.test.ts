// @vitest-environment happy-dom
import { h, render } from 'preact';
import { act } from 'preact/test-utils';
import { afterEach, describe, expect, it } from 'vitest';
import { sectionDesignSchema, type SectionDesign } from '../../../core/records/design';
import type { UnitSystem } from '../../../core/units';
import type { JudgementDesign } from '../../../web/judgement/design-extras';
import { DesignBasisForm } from '../../../web/screens/design/DesignBasisForm';
import { designFormStart, readDesignForm } from '../../../web/screens/design/design-form';
import { expectClose } from '../../helpers/expect-close';
import { drakeLine, FOOT, POUND_FORCE, SIXTY_F } from './line-fixture';

/** Field precision of core/units (metric: tension 0.01 kN, sag 0.01 m; US: 1 lbf, 0.01 ft, 0.1 °F). */
const metricTension = 28_023.8; // 6300 lbf in N (NIST SP 811 pound-force)

function roundTrip(design: SectionDesign, units: UnitSystem): JudgementDesign {
  const read = readDesignForm(designFormStart(design, units), units);
  if (!read.ok) throw new Error(`form refused its own start: ${read.summary} ${JSON.stringify(read.errors)}`);
  expect(sectionDesignSchema.safeParse(read.design).success).toBe(true);
  return read.design;
}

describe('design form text ↔ design (pure)', () => {
  const tensionDesign: JudgementDesign = {
    basis: {
      kind: 'tension',
      horizontalTension: 6300 * POUND_FORCE,
      referenceTemperature: SIXTY_F,
      state: 'initial',
      creepOffset: 21,
    },
    rulingSpanOverride: 700 * FOOT,
    maxDesignTemperature: 100,
    terrainCategory: 2,
    tolerance: { sagAbsolute: 0.15, sagRelative: 0.05, combine: 'smaller' },
    compareState: 'final',
    vibrationTemperature: -5,
    uncertainty: { sag: 0.03, weightRelative: 0.01 },
  };

  it('round-trips a tension design in US units to their field precision', () => {
    const back = roundTrip(tensionDesign, 'us');
    if (back.basis.kind !== 'tension') throw new Error('kind lost');
    // 6300 lbf and 700 ft are whole in the US fields: exact up to floating point.
    expectClose(back.basis.horizontalTension ?? Number.NaN, 6300 * POUND_FORCE, 1e-12, 'tension');
    expectClose(back.rulingSpanOverride ?? Number.NaN, 700 * FOOT, 1e-12, 'ruling span');
    // 60.0 °F is 15.56 °C; 21 °C of creep is 37.8 °F of difference (× 9/5).
    expectClose(back.basis.referenceTemperature, SIXTY_F, 1e-12, 'reference temperature');
    expectClose(back.basis.creepOffset, 21, 1e-12, 'creep');
    expectClose(back.maxDesignTemperature, 100, 1e-12, 'max temperature');
    // 0.15 m shows as 0.49 ft (0.149 m): 0.01 ft field precision is 2 % of it.
    expectClose(back.tolerance?.sagAbsolute ?? Number.NaN, 0.15, 0.02, 'tolerance');
    expectClose(back.tolerance?.sagRelative ?? Number.NaN, 0.05, 1e-12, 'relative tolerance');
    expect(back.tolerance?.combine).toBe('smaller');
    expect(back.basis.state).toBe('initial');
    expect(back.terrainCategory).toBe(2);
    expect(back.compareState).toBe('final');
    // −5 °C = 23.0 °F.
    expectClose(back.vibrationTemperature ?? Number.NaN, -5, 1e-12, 'vibration temperature');
    expectClose(back.uncertainty?.sag ?? Number.NaN, 0.03, 0.01, 'sag uncertainty');
    expectClose(back.uncertainty?.weightRelative ?? Number.NaN, 0.01, 1e-12, 'weight uncertainty');
  });

  it('round-trips the same design in metric units to their field precision', () => {
    const back = roundTrip(tensionDesign, 'metric');
    if (back.basis.kind !== 'tension') throw new Error('kind lost');
    // 28.02 kN shown for 28 023.8 N: 0.01 kN precision is 2e-4 relative.
    expectClose(back.basis.horizontalTension ?? Number.NaN, metricTension, 2e-4, 'tension');
    expectClose(back.basis.referenceTemperature, SIXTY_F, 0.05 / SIXTY_F, 'reference temperature');
    expectClose(back.tolerance?.sagAbsolute ?? Number.NaN, 0.15, 1e-12, 'tolerance');
    expectClose(back.rulingSpanOverride ?? Number.NaN, 700 * FOOT, 0.005 / (700 * FOOT), 'ruling span');
  });

  it('round-trips a sag table with its state and creep allowance', () => {
    // Two made-up rows, chosen only to round-trip (not a conductor's table): 0 °C 3.2 m, 50 °C 4.1 m.
    const table = {
      basis: {
        kind: 'table' as const,
        rows: [
          { temperature: 0, sag: 3.2 },
          { temperature: 50, sag: 4.1 },
        ],
        state: 'final' as const,
        creepOffset: 10,
      },
      maxDesignTemperature: 75,
      terrainCategory: 4 as const,
    };
    const back = roundTrip(table, 'metric');
    expect(back.basis).toEqual(table.basis);
    const us = roundTrip(table, 'us');
    if (us.basis.kind !== 'table') throw new Error('kind lost');
    expectClose(us.basis.rows[1]?.sag ?? Number.NaN, 4.1, 0.0015 / 4.1, 'sag in ft');
    expectClose(us.basis.rows[1]?.temperature ?? Number.NaN, 50, 1e-12, 'temperature in °F');
  });

  it('puts a message beside each bad field and never returns a design with NaN', () => {
    const start = designFormStart(undefined, 'metric');
    const bad = readDesignForm(
      {
        ...start,
        tension: 'lots',
        referenceTemperature: '15,5,5',
        maxDesignTemperature: '',
        toleranceAbsolute: '-0.1',
      },
      'metric',
    );
    expect(bad.ok).toBe(false);
    expect(bad.errors.tension).toBe('"lots" is not a number.');
    expect(bad.errors.referenceTemperature).toMatch(/decimal point/);
    expect(bad.errors.maxDesignTemperature).toBe('Enter a number.');
    expect(bad.errors.toleranceAbsolute).toBe('Cannot be negative.');
    const percent = readDesignForm(
      { ...start, tensionGivenAs: 'percent', percent: '120', maxDesignTemperature: '75' },
      'metric',
    );
    expect(percent.errors.percent).toMatch(/at most 100/);
    const table = readDesignForm(
      {
        ...start,
        basisKind: 'table',
        tableRows: [
          { temperature: '15', sag: '3' },
          { temperature: '15', sag: '3.5' },
        ],
        maxDesignTemperature: '75',
      },
      'metric',
    );
    expect(table.errors.rows).toMatch(/only once/);
  });

  it('does not flag empty required fields before the first save', () => {
    const early = readDesignForm(designFormStart(undefined, 'us'), 'us', { requireAll: false });
    expect(early.errors.tension).toBeUndefined();
    expect(early.errors.maxDesignTemperature).toBeUndefined();
  });
});

describe('DesignBasisForm', () => {
  let host: HTMLElement;
  afterEach(() => {
    render(null, host);
    host.remove();
  });

  function type(id: string, text: string): void {
    const input = host.querySelector<HTMLInputElement>(`#${id}`);
    if (!input) throw new Error(`no field #${id}`);
    void act(() => {
      input.value = text;
      input.dispatchEvent(new Event('input', { bubbles: true }));
    });
  }

  async function submit(): Promise<void> {
    const form = host.querySelector('form');
    await act(async () => {
      form?.dispatchEvent(new Event('submit', { bubbles: true, cancelable: true }));
      await Promise.resolve();
    });
  }

  it('refuses bad input with a message beside the field, then saves a schema-valid design', async () => {
    const f = drakeLine(null, 'us');
    const saved: SectionDesign[] = [];
    host = document.createElement('div');
    document.body.appendChild(host);
    void act(() => {
      render(
        h(DesignBasisForm, {
          section: f.section,
          spans: f.records.spans,
          unitSystem: 'us',
          locale: 'en-US',
          onSave: (design: SectionDesign) => {
            saved.push(design);
          },
        }),
        host,
      );
    });
    // The computed ruling span of a one-span section is that span: 700.00 ft.
    expect(host.querySelector('[data-testid="computed-ruling-span"]')?.textContent).toBe('700.00 ft');
    type('design-tension', '6300');
    type('design-maxDesignTemperature', 'hot');
    await submit();
    expect(saved).toHaveLength(0);
    const message = host.querySelector('#design-maxDesignTemperature-message');
    expect(message?.textContent).toBe('"hot" is not a number.');
    expect(host.querySelector('[data-testid="design-form-message"]')?.textContent).toMatch(/need a fix/);
    type('design-maxDesignTemperature', '212');
    await submit();
    expect(saved).toHaveLength(1);
    const design = saved[0]!;
    expect(sectionDesignSchema.safeParse(design).success).toBe(true);
    expectClose(design.maxDesignTemperature, 100, 1e-12, '212 °F');
    if (design.basis.kind !== 'tension') throw new Error('kind lost');
    expectClose(design.basis.horizontalTension ?? Number.NaN, 6300 * POUND_FORCE, 1e-12, '6300 lbf');
    expect(JSON.stringify(design)).not.toContain('null');
  });
});
