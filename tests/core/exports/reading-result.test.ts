// The exports' result function from stored records. Check values: the catenary relations of SPEC section 2
// (D = C·(cosh(S/2C) − 1) for a level span, support tension T = H + w·D, the textbook parabola D ≈ w·S²/(8H) for
// comparison) and the default sag tolerance of ±150 mm (IEEE Std 524 as quoted by Douglass & Thrash, project
// references).
import { describe, expect, it } from 'vitest';
import {
  readingResultFunction,
  writeInspectionLog,
  type InspectionLogInput,
  type RecordSet,
  type SectionRecord,
} from '../../../core';
import { expectClose } from '../../helpers/expect-close';
import { fixtureLine, fixtureLogInput } from './line-fixture';

/** A level 100 m span (the fixture's first) with one midspan-sag reading at 15 °C. */
function levelLine(sag: number, design?: SectionRecord['design']): RecordSet {
  const records = fixtureLine({ spans: 1 });
  const span = records.span[0]!;
  span.farAttachmentElevation = span.nearAttachmentElevation;
  span.farGroundElevation = span.nearGroundElevation;
  expect(span.length).toBe(100);
  for (const section of records.section) if (design) section.design = design;
  records.reading = records.reading.slice(0, 1).map((reading) => ({
    ...reading,
    measurement: { method: 'midspan-sag', sag },
    conductorTemperature: 15,
  }));
  return records;
}

function resultOf(records: RecordSet) {
  const input: InspectionLogInput = fixtureLogInput(records, false);
  const resultFor = readingResultFunction(input);
  const section = records.section.find((item) => item.id === records.span[0]?.sectionId);
  return {
    result: resultFor(contextOf(input)),
    weight: section?.conductor.weight ?? 0,
    section,
    input,
    resultFor,
  };
}

function contextOf(input: InspectionLogInput) {
  const reading = input.readings[0]!;
  const span = input.spans[0]!;
  return {
    line: input.line,
    section: input.sections.find((section) => section.id === span.sectionId),
    span,
    wire: input.wires.find((wire) => wire.id === reading.wireId)!,
    reading,
    nearStructure: input.structures[0],
    farStructure: input.structures[1],
  };
}

describe('readingResultFunction', () => {
  it('without a design: solved H near the parabola, sag as read, % of rated strength from T = H + w·D', () => {
    const sag = 1.2345;
    const { result, weight, section } = resultOf(levelLine(sag));
    const tension = result.horizontalTension ?? Number.NaN;
    // Parabola w·S²/(8D) differs from the exact catenary by about (D/S)² relative: < 1e-3 here.
    expectClose(tension, (weight * 100 * 100) / (8 * sag), 1e-3, 'H against the parabola');
    expectClose(result.sag ?? Number.NaN, sag, 1e-9, 'sag as read');
    const support = tension + weight * sag;
    expectClose(
      result.percentOfRatedStrength ?? Number.NaN,
      (100 * support) / (section?.conductor.ratedStrength ?? 1),
      1e-6,
      '% RBS',
    );
    expect(result.verdict).toBeUndefined();
  });

  it('with a design tension at the reading temperature: design sag from the catenary, deviation and verdict', () => {
    const designTension = 25_000;
    const records = levelLine(2.0, {
      basis: {
        kind: 'tension',
        horizontalTension: designTension,
        referenceTemperature: 15,
        state: 'initial',
        creepOffset: 0,
      },
      maxDesignTemperature: 75,
      terrainCategory: 2,
    });
    const { result, weight } = resultOf(records);
    const c = designTension / weight;
    const designSag = c * (Math.cosh(100 / (2 * c)) - 1);
    expectClose(result.designSag ?? Number.NaN, designSag, 1e-6, 'design sag');
    expectClose(result.designHorizontalTension ?? Number.NaN, designTension, 1e-6, 'design H');
    expectClose(result.sagDeviation ?? Number.NaN, 2.0 - designSag, 1e-6, 'deviation');
    // About 2.0 − 0.80 = 1.2 m slacker than design, far beyond ±0.15 m.
    expect(result.verdict).toBe('too-slack');
    expect(result.verdictReason).toMatch(/\S/);
    expect(result.clearanceMargin).toBeDefined();

    const csv = writeInspectionLog({
      ...fixtureLogInput(records, false),
      resultFor: readingResultFunction(fixtureLogInput(records, false)),
    });
    expect(csv).toContain(',Too slack,');
  });

  it('a reading the solver refuses gets its message and no figures', () => {
    const { result } = resultOf(levelLine(-0.5));
    expect(result.errorCode).toBe('sag-not-positive');
    expect(result.error).toMatch(/\S/);
    expect(result.horizontalTension).toBeUndefined();
  });
});
