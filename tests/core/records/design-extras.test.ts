import { describe, expect, it } from 'vitest';
import { sectionDesignSchema, type SectionDesign } from '../../../core';

// The judgement's extra settings must survive validation (zod strips unknown keys, so a field missing from the
// schema would silently vanish on the next save and the checks would fall back to defaults).
describe('sectionDesignSchema keeps the judgement settings', () => {
  const design: SectionDesign = {
    basis: {
      kind: 'table',
      rows: [
        { temperature: 0, sag: 2.1 },
        { temperature: 40, sag: 2.9 },
      ],
      creepOffset: 17,
    },
    maxDesignTemperature: 75,
    terrainCategory: 3,
    compareState: 'final',
    vibrationTemperature: -4,
    loading: { label: 'Heavy ice', temperature: -18, iceThickness: 0.0127, windPressure: 190 },
    uncertainty: { sag: 0.03, temperature: 0.5 },
  };

  it('returns every extra field unchanged', () => {
    expect(sectionDesignSchema.parse(design)).toEqual(design);
  });

  it('refuses a negative ice thickness and a negative uncertainty', () => {
    const badIce = { ...design, loading: { ...design.loading!, iceThickness: -0.01 } };
    const badSigma = { ...design, uncertainty: { sag: -0.01 } };
    expect(sectionDesignSchema.safeParse(badIce).success).toBe(false);
    expect(sectionDesignSchema.safeParse(badSigma).success).toBe(false);
  });
});
