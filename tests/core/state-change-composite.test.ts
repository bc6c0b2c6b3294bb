import { describe, expect, it } from 'vitest';
import {
  compositeFromConductor,
  findConductor,
  kneePointTemperature,
  spanAtTension,
  steelCoreFromConductor,
  tensionAtState,
  tensionAtStateComposite,
  type CompositeConductor,
} from '../../core';
import { expectClose } from '../helpers/expect-close';
import { expectCode } from '../helpers/expect-code';

/** Drake 795 kcmil 26/7 from the library: GO 95 Table 23 sizes, derived material split and moduli. */
const drake = findConductor('Drake');
if (!drake?.composite) throw new Error('Drake missing from the conductor library');
const composite: CompositeConductor = drake.composite;
const weight = drake.weight;
// A 300 m level span at 20 % of rated strength, 15 °C: a common everyday design point (common practice).
const g = { span: 300, rise: 0 };
const from = { horizontalTension: 0.2 * drake.ratedStrength, temperature: 15, weight };
const atTemperature = (t: number): number =>
  tensionAtStateComposite(g, composite, from, { temperature: t, weight });
const sagAt = (t: number): number => spanAtTension(g, weight, atTemperature(t)).midspanSag;

describe('bimetallic (aluminium + steel core) state change', () => {
  const knee = kneePointTemperature(g, composite, from, weight);

  it('finds a knee point above the everyday temperature (ACSR knee typically 50–150 °C, from memory)', () => {
    expect(knee).toBeGreaterThan(50);
    expect(knee).toBeLessThan(150);
  });

  it('keeps the tension continuous across the knee (jump no larger than the slope allows)', () => {
    const delta = 1e-3;
    const below = atTemperature(knee - delta);
    const above = atTemperature(knee + delta);
    const slope = (atTemperature(knee - 1) - atTemperature(knee - 2)) / 1; // N/°C just below the knee
    expect(Math.abs(above - below)).toBeLessThan(Math.abs(slope) * 2 * delta * 1.01);
    // A kink, not a step: tension keeps falling monotonically through the knee.
    const atKnee = atTemperature(knee);
    expect(below).toBeGreaterThan(atKnee);
    expect(atKnee).toBeGreaterThan(above);
  });

  it('above the knee the sag grows at the steel-only rate (EA = E_sA_s, α = α_s) to 1 %', () => {
    const t1 = knee + 10;
    const t2 = knee + 40;
    const compositeRate = (sagAt(t2) - sagAt(t1)) / (t2 - t1);
    const steelOnly = steelCoreFromConductor(composite);
    const startState = { horizontalTension: atTemperature(t1), temperature: t1, weight };
    const steelTension = tensionAtState(g, steelOnly, startState, { temperature: t2, weight });
    const steelRate = (spanAtTension(g, weight, steelTension).midspanSag - sagAt(t1)) / (t2 - t1);
    expectClose(compositeRate, steelRate, 1e-2, 'd(sag)/dt above the knee');
    // …and visibly faster than the composite rule-of-mixtures model would predict there would be wrong:
    const linear = compositeFromConductor(composite);
    const linearTension = tensionAtState(g, linear, startState, { temperature: t2, weight });
    const linearRate = (spanAtTension(g, weight, linearTension).midspanSag - sagAt(t1)) / (t2 - t1);
    expect(Math.abs(linearRate / compositeRate - 1)).toBeGreaterThan(0.05);
  });

  it('below the knee equals the linear model with composite EA and α to 1e-4', () => {
    // The two differ only at second order in α·Δt (the spread of α between the metals), ≈ 1e-5 in tension here.
    const linear = compositeFromConductor(composite);
    for (const t of [-30, 0, 15, 40, knee - 5]) {
      const h = tensionAtState(g, linear, from, { temperature: t, weight });
      expectClose(atTemperature(t), h, 1e-4, `at ${t.toFixed(1)} °C`);
    }
    // Under ice load too (twice the bare weight at −5 °C).
    const iced = { temperature: -5, weight: 2 * weight };
    expectClose(
      tensionAtStateComposite(g, composite, from, iced),
      tensionAtState(g, linear, from, iced),
      1e-4,
      'iced',
    );
  });

  it('the knee is where the composite model starts to follow the steel core', () => {
    // Just above the knee, the steel-only model continued from the knee matches the composite model.
    const kneeState = { horizontalTension: atTemperature(knee), temperature: knee, weight };
    const steelOnly = steelCoreFromConductor(composite);
    const h = tensionAtState(g, steelOnly, kneeState, { temperature: knee + 30, weight });
    expectClose(atTemperature(knee + 30), h, 1e-5, 'steel-only continuation');
  });

  it('aluminium slack at the known state (creep, settlement) lowers the knee', () => {
    // Derived bounds: the aluminium's zero-stress length grows at α_a per °C while the wire itself grows at a rate r
    // between 0 (it never shortens on heating) and α_s (tension falls, so it grows no faster than the free steel),
    // so a slack strain δ moves the knee by δ/(α_a − r), between δ/α_a and δ/(α_a − α_s).
    const slack = 2e-4;
    const shift = knee - kneePointTemperature(g, composite, from, weight, { aluminiumSlackStrain: slack });
    expect(shift).toBeGreaterThan(slack / composite.aluminiumExpansion);
    expect(shift).toBeLessThan(slack / (composite.aluminiumExpansion - composite.steelExpansion));
  });

  it('rejects invalid material data with conductor-invalid', () => {
    const to = { temperature: 50, weight };
    expectCode(
      () => tensionAtStateComposite(g, { ...composite, steelArea: 0 }, from, to),
      'conductor-invalid',
    );
    expectCode(
      () => tensionAtStateComposite(g, { ...composite, aluminiumModulus: -1 }, from, to),
      'conductor-invalid',
    );
    expectCode(
      () =>
        kneePointTemperature(g, { ...composite, aluminiumExpansion: composite.steelExpansion }, from, weight),
      'conductor-invalid',
    );
    expectCode(
      () => tensionAtStateComposite(g, composite, from, to, { aluminiumSlackStrain: Number.NaN }),
      'conductor-invalid',
    );
    expectCode(
      () => tensionAtStateComposite(g, composite, from, { temperature: 50, weight: 0 }),
      'state-invalid',
    );
  });
});
