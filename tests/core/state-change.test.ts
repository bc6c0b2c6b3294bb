import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  classicStateChangeCubic,
  creepAdjustedTemperature,
  DEFAULT_CREEP_TEMPERATURE_OFFSET,
  spanAtTension,
  tensionAtState,
  type ElasticConductor,
} from '../../core';
import { expectClose } from '../helpers/expect-close';
import { expectCode } from '../helpers/expect-code';

/** An aluminium-steel conductor of Drake size: EA ≈ 34.7 MN, α ≈ 18.8e-6 /°C (derived, core/conductors). */
const drakeLike: ElasticConductor = { axialStiffness: 3.47e7, expansion: 18.8e-6 };
const drakeWeight = 15.95; // N/m (GO 95 Table 23: 1.093 lb/ft)

describe('tensionAtState', () => {
  it('returns the same tension when nothing changes (identity to 1e-12)', () => {
    const from = { horizontalTension: 28000, temperature: 15, weight: drakeWeight };
    const h = tensionAtState({ span: 320, rise: 45 }, drakeLike, from, {
      temperature: 15,
      weight: drakeWeight,
    });
    expectClose(h, 28000, 1e-12, 'no change of state');
  });

  it('loses tension on heating and gains it on cooling and under extra load (physics, common practice)', () => {
    const g = { span: 300, rise: 0 };
    const from = { horizontalTension: 25000, temperature: 15, weight: drakeWeight };
    const hot = tensionAtState(g, drakeLike, from, { temperature: 75, weight: drakeWeight });
    const cold = tensionAtState(g, drakeLike, from, { temperature: -20, weight: drakeWeight });
    const iced = tensionAtState(g, drakeLike, from, { temperature: 15, weight: 2 * drakeWeight });
    expect(hot).toBeLessThan(25000);
    expect(cold).toBeGreaterThan(25000);
    expect(iced).toBeGreaterThan(25000);
  });

  it('agrees with the classic parabolic cubic within 0.1 % on level spans with small sag (SPEC §4)', () => {
    // Sag/span 0.5 %–3.5 %: the cubic drops terms of order (sag/span)² in slack and tension, well under 0.1 %.
    const cases = [
      { span: 120, h1: 12000, t2: 40, w2: drakeWeight },
      { span: 300, h1: 25000, t2: -10, w2: drakeWeight },
      { span: 450, h1: 30000, t2: 60, w2: drakeWeight },
      { span: 250, h1: 20000, t2: 0, w2: 2.2 * drakeWeight },
    ];
    for (const k of cases) {
      const from = { horizontalTension: k.h1, temperature: 15, weight: drakeWeight };
      const to = { temperature: k.t2, weight: k.w2 };
      const exact = tensionAtState({ span: k.span, rise: 0 }, drakeLike, from, to);
      const cubic = classicStateChangeCubic(k.span, drakeLike, from, to);
      const sagRatio = spanAtTension({ span: k.span, rise: 0 }, k.w2, exact).midspanSag / k.span;
      expect(sagRatio).toBeLessThan(0.04);
      expectClose(exact, cubic, 1e-3, `span ${k.span} m to ${k.t2} °C`);
    }
  });

  it('keeps the unstressed length: the arc length at state 2 equals L₀·(1+αΔt)·(1+T̄₂/EA) (SPEC §4)', () => {
    const g = { span: 380, rise: -60 };
    const from = { horizontalTension: 26000, temperature: 10, weight: drakeWeight };
    const to = { temperature: 55, weight: 1.3 * drakeWeight };
    const h2 = tensionAtState(g, drakeLike, from, to);
    const first = spanAtTension(g, from.weight, from.horizontalTension);
    const second = spanAtTension(g, to.weight, h2);
    const unstressed = first.arcLength / (1 + first.meanTension / drakeLike.axialStiffness);
    // Thermal growth referred to 20 °C: (1 + α·(55 − 20))/(1 + α·(10 − 20)).
    const growth = (1 + drakeLike.expansion * 35) / (1 - drakeLike.expansion * 10);
    const expected = unstressed * growth * (1 + second.meanTension / drakeLike.axialStiffness);
    expectClose(second.arcLength, expected, 1e-14, 'arc length at state 2');
  });

  it('A → B → A returns to A within 1e-9 (fast-check, fixed seed)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 30, max: 1000, noNaN: true }),
        fc.double({ min: -0.4, max: 0.4, noNaN: true }),
        fc.double({ min: 0.005, max: 0.06, noNaN: true }),
        fc.double({ min: -30, max: 90, noNaN: true }),
        fc.double({ min: 1, max: 3, noNaN: true }),
        fc.double({ min: 5e6, max: 2e8, noNaN: true }),
        (span, slope, sagRatio, temperature, loadFactor, stiffness) => {
          const g = { span, rise: slope * span };
          const conductor = { axialStiffness: stiffness, expansion: 19e-6 };
          const h1 = (drakeWeight * span) / (8 * sagRatio);
          const a = { horizontalTension: h1, temperature: 15, weight: drakeWeight };
          const b = { temperature, weight: loadFactor * drakeWeight };
          const hB = tensionAtState(g, conductor, a, b);
          const back = tensionAtState(g, conductor, { horizontalTension: hB, ...b }, a);
          expectClose(back, h1, 1e-9, 'A → B → A');
        },
      ),
      { seed: 20261201, numRuns: 150 },
    );
  });

  it('rejects invalid conductors and states with specific codes', () => {
    const g = { span: 200, rise: 0 };
    const from = { horizontalTension: 20000, temperature: 15, weight: drakeWeight };
    const to = { temperature: 40, weight: drakeWeight };
    expectCode(
      () => tensionAtState(g, { axialStiffness: 0, expansion: 1e-5 }, from, to),
      'conductor-invalid',
    );
    expectCode(
      () => tensionAtState(g, { axialStiffness: -1, expansion: 1e-5 }, from, to),
      'conductor-invalid',
    );
    expectCode(
      () => tensionAtState(g, { axialStiffness: 1e7, expansion: Number.NaN }, from, to),
      'conductor-invalid',
    );
    expectCode(() => tensionAtState(g, drakeLike, { ...from, horizontalTension: 0 }, to), 'state-invalid');
    expectCode(() => tensionAtState(g, drakeLike, { ...from, weight: -2 }, to), 'state-invalid');
    expectCode(
      () => tensionAtState(g, drakeLike, from, { temperature: Number.POSITIVE_INFINITY, weight: 1 }),
      'state-invalid',
    );
    expectCode(() => tensionAtState(g, drakeLike, from, { temperature: 20, weight: 0 }), 'state-invalid');
    expectCode(() => tensionAtState({ span: 0, rise: 0 }, drakeLike, from, to), 'span-not-positive');
    expectCode(() => classicStateChangeCubic(-5, drakeLike, from, to), 'span-not-positive');
    expectCode(
      () => classicStateChangeCubic(200, { axialStiffness: 0, expansion: 0 }, from, to),
      'conductor-invalid',
    );
  });
});

describe('creepAdjustedTemperature', () => {
  it('adds the creep offset going from initial to final and removes it going back', () => {
    // Default +21 °C: derived from the handbook Drake/Arbutus initial vs final rows (REFERENCES, creep).
    expectClose(
      creepAdjustedTemperature(30, 'initial', 'final'),
      30 + DEFAULT_CREEP_TEMPERATURE_OFFSET,
      1e-15,
      'initial → final',
    );
    expectClose(
      creepAdjustedTemperature(30, 'final', 'initial'),
      30 - DEFAULT_CREEP_TEMPERATURE_OFFSET,
      1e-15,
      'final → initial',
    );
    expectClose(creepAdjustedTemperature(30, 'final', 'final', 15), 30, 1e-15, 'same condition');
    expectClose(creepAdjustedTemperature(30, 'initial', 'final', 0), 30, 1e-15, 'creep switched off with 0');
  });
});
