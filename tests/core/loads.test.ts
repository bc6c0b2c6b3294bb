import { describe, expect, it } from 'vitest';
import { conductorLoad } from '../../core';
import { KILOGRAM_FORCE, wadhwa72 } from '../fixtures/textbook-examples';
import { expectClose } from '../helpers/expect-close';
import { expectCode } from '../helpers/expect-code';

describe('conductorLoad', () => {
  const e = wadhwa72;
  const load = conductorLoad({
    bareWeight: e.weightKgPerM * KILOGRAM_FORCE,
    diameter: e.diameter,
    iceThickness: e.iceThickness,
    iceDensity: e.iceDensity,
    windPressure: e.windKgPerSquareMetre * KILOGRAM_FORCE,
  });

  it('reproduces the ice, wind and resultant loads of Wadhwa Ex. 7.2 (kg/m as printed in the working)', () => {
    // By hand from the book's data: ice 910·π·0.013·(0.0195 + 0.013) = 1.2078 kg/m; wind 39·(0.0195 + 0.026)
    // = 1.7745 kg/m; resultant √(2.0578² + 1.7745²) = 2.7173 kg/m.
    expectClose(load.ice / KILOGRAM_FORCE, 1.2078, 1e-4, `${e.source} ice`);
    expectClose(load.wind / KILOGRAM_FORCE, 1.7745, 1e-4, `${e.source} wind`);
    expectClose(load.resultant / KILOGRAM_FORCE, 2.7173, 1e-4, `${e.source} resultant`);
    expectClose(load.vertical, load.bare + load.ice, 1e-15, 'vertical = bare + ice');
    expectClose(Math.tan(load.swingAngle), load.wind / load.vertical, 1e-12, 'swing angle');
  });

  it('is the bare weight with no ice and no wind', () => {
    const bare = conductorLoad({ bareWeight: 15.95, diameter: 0.02814 });
    expectClose(bare.resultant, 15.95, 1e-15, 'bare');
    expect(bare.swingAngle).toBe(0);
  });

  it('wind alone acts on the bare diameter: resultant √(w² + (p·d)²)', () => {
    // Gupta Ex. E16 data: 0.85 kg/m, 19.5 mm, 38.5 kg/m² → √(0.85² + 0.75075²) = 1.1341 kg/m (hand computation).
    const windOnly = conductorLoad({
      bareWeight: 0.85 * KILOGRAM_FORCE,
      diameter: 0.0195,
      windPressure: 38.5 * KILOGRAM_FORCE,
    });
    expectClose(windOnly.resultant / KILOGRAM_FORCE, 1.1341, 1e-4, 'Gupta Ex. E16 loaded weight');
  });

  it('rejects negative ice or wind, and bad weight or diameter, by code', () => {
    const base = { bareWeight: 10, diameter: 0.02 };
    expectCode(() => conductorLoad({ ...base, iceThickness: -0.001 }), 'state-invalid');
    expectCode(() => conductorLoad({ ...base, windPressure: -5 }), 'state-invalid');
    expectCode(() => conductorLoad({ ...base, iceDensity: 0 }), 'state-invalid');
    expectCode(() => conductorLoad({ ...base, bareWeight: 0 }), 'weight-not-positive');
    expectCode(() => conductorLoad({ ...base, diameter: Number.NaN }), 'conductor-invalid');
  });
});
