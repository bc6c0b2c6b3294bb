import { describe, it, expect } from 'vitest';
import {
  conductorLoad,
  NESC_TENSION_LIMITS,
  spanAtTension,
  supportTensionPercent,
  tensionChecks,
  terrainLimitFor,
  TYPICAL_UTILITY_TENSION_LIMITS,
  vibrationCheck,
} from '../../../core';
import { expectClose } from '../../helpers/expect-close';
import { FOOT, POUND_FORCE, SIXTY_F, drakeConductor } from './drake-section';

const level700 = { span: 700 * FOOT, rise: 0 };
const conductor = drakeConductor();
const designState = {
  horizontalTension: 6300 * POUND_FORCE,
  temperature: SIXTY_F,
  state: 'initial' as const,
};

describe('tension limits', () => {
  it('carry the published defaults with their sources', () => {
    // Douglass & Thrash, Electric Power Engineering Handbook (NESC as quoted): 33.3 % initial and 25 % final
    // unloaded at 60 °F, 60 % under maximum load; typical utility design 25 % / 15 % / 60 %.
    expect(NESC_TENSION_LIMITS.map((l) => l.percentOfRated)).toEqual([33.3, 25, 60]);
    expect(TYPICAL_UTILITY_TENSION_LIMITS.map((l) => l.percentOfRated)).toEqual([25, 15, 60]);
    for (const limit of [...NESC_TENSION_LIMITS, ...TYPICAL_UTILITY_TENSION_LIMITS]) {
      expect(limit.source.length).toBeGreaterThan(10);
      expectClose(limit.temperature, 15.5555555556, 1e-9, '60 °F');
    }
  });

  it('puts the handbook Drake design at about 20 % of rated strength initial at 60 °F', () => {
    // 6300 lb / 31,200 lb (GO 95 Table 23) = 20.19 % horizontal; the support tension adds w·sag ≈ 11.6 lb.
    const [initial, final, loaded] = tensionChecks(level700, level700, conductor, designState, 21);
    expect(initial?.status).toBe('pass');
    expectClose(initial?.horizontalTension ?? Number.NaN, 6300 * POUND_FORCE, 1e-9);
    expectClose(initial?.percentOfRated ?? Number.NaN, (100 * (6300 + 1.094 * 10.64)) / 31200, 1e-3);
    // Final (crept) tension is lower than initial at the same temperature.
    expect(final?.horizontalTension ?? Number.NaN).toBeLessThan(initial?.horizontalTension ?? Number.NaN);
    expect(loaded?.status).toBe('not-checked');
  });

  it('fails the typical utility final limit for a wire strung far too tight', () => {
    const tight = { ...designState, horizontalTension: 9500 * POUND_FORCE };
    const checks = tensionChecks(level700, level700, conductor, tight, 21, {
      tensionLimits: [...TYPICAL_UTILITY_TENSION_LIMITS],
    });
    expect(checks[0]?.status).toBe('fail');
    expect(checks[0]?.margin).toBeLessThan(0);
  });

  it('checks the loaded limit under ice and wind when a loaded condition is given', () => {
    // Loads per core/loads (textbook formula): 12.7 mm radial ice, 190 Pa wind, at −20 °C (illustrative).
    const load = conductorLoad({
      bareWeight: conductor.weight,
      diameter: conductor.diameter ?? 0,
      iceThickness: 0.0127,
      windPressure: 190,
    });
    const checks = tensionChecks(level700, level700, conductor, designState, 21, {
      loadedCondition: { label: 'ice and wind', temperature: -20, weight: load.resultant },
    });
    const loaded = checks[2];
    expect(loaded?.status).not.toBe('not-checked');
    expect(loaded?.horizontalTension ?? 0).toBeGreaterThan(6300 * POUND_FORCE);
    const direct = supportTensionPercent(
      level700,
      load.resultant,
      loaded?.horizontalTension ?? Number.NaN,
      conductor.ratedStrength,
    );
    expectClose(loaded?.percentOfRated ?? Number.NaN, direct.percentOfRated, 1e-12);
  });

  it('takes the higher support tension on an inclined span', () => {
    // [derived] T = H·cosh(u) is largest at the higher support.
    const g = { span: 200, rise: 40 };
    const s = spanAtTension(g, 15, 20000);
    const result = supportTensionPercent(g, 15, 20000, 100000);
    expectClose(result.supportTension, s.farSupportTension, 1e-12);
  });
});

describe('aeolian-vibration guidance', () => {
  it('uses the terrain limits recalled from CIGRE TB 273 (from memory)', () => {
    // From memory (labelled so in the data): 1000, 1125, 1225, 1425 m for terrain categories 1–4.
    expect(([1, 2, 3, 4] as const).map((c) => terrainLimitFor(c).maxCatenaryParameter)).toEqual([
      1000, 1125, 1225, 1425,
    ]);
    expect(terrainLimitFor(1).source).toContain('FROM MEMORY');
  });

  it('computes H/w at the check temperature and its margin', () => {
    // The handbook design: H/w = 6300 lb / 1.094 lb/ft = 5758.7 ft = 1755.3 m at 60 °F, above every terrain limit:
    // such a tension would need dampers under this guidance.
    const check = vibrationCheck(level700, conductor, designState, 21, 4, { vibrationTemperature: SIXTY_F });
    expectClose(check.catenaryParameter, (6300 / 1.094) * FOOT, 1e-9);
    expect(check.status).toBe('fail');
    expectClose(check.margin, 1425 - check.catenaryParameter, 1e-12);
    const slack = vibrationCheck(
      level700,
      conductor,
      { ...designState, horizontalTension: 3000 * POUND_FORCE },
      21,
      2,
      {
        vibrationTemperature: SIXTY_F,
      },
    );
    expect(slack.status).toBe('pass');
  });
});
