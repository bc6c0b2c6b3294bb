// A small hand-built line for the judgement tests: one Drake tension section with the handbook's design basis, a
// 700 ft level span with ground under it, and wires A and B. Records are built in full so that they pass the
// records schemas, as storage would hand them over.
import { findConductor } from '../../../core/conductors';
import type { ConductorSpec } from '../../../core/records/conductor';
import type { SectionDesign } from '../../../core/records/design';
import type { LineRecord } from '../../../core/records/line';
import type { ReadingRecord } from '../../../core/records/reading';
import type { SectionRecord } from '../../../core/records/section';
import type { SpanRecord } from '../../../core/records/span';
import type { WireRecord } from '../../../core/records/wire';
import type { Measurement } from '../../../core/types';
import type { UnitSystem } from '../../../core/units';
import type { JudgementRecords } from '../../../web/judgement/assess-line';

/** Exact conversions (NIST SP 811). */
export const FOOT = 0.3048;
export const POUND_FORCE = 4.4482216152605;
/** 60 °F in °C. */
export const SIXTY_F = ((60 - 32) * 5) / 9;

const META = { updatedAt: '2026-05-14T08:00:00.000Z', revision: 1, deleted: false, deviceId: 'test-device' };

let counter = 0;
/** Deterministic UUIDs (version-4 shape) so the fixtures pass the records schema. */
export function testId(): string {
  counter += 1;
  return `00000000-0000-4000-8000-${counter.toString(16).padStart(12, '0')}`;
}

/**
 * Drake 795 kcmil 26/7 as the handbook example uses it: 1.094 lb/ft (Douglass & Thrash, Table 14.5), rated strength
 * 31,200 lb (CPUC GO 95 App. B Table 23), moduli and expansion from the conductor library (derived).
 */
export function drakeSpec(): ConductorSpec {
  const library = findConductor('drake');
  if (!library) throw new Error('Drake missing from the conductor library');
  return {
    name: 'Drake 795 kcmil 26/7',
    diameter: library.diameter,
    area: library.area,
    weight: (1.094 * POUND_FORCE) / FOOT,
    ratedStrength: 31200 * POUND_FORCE,
    modulus: library.modulus,
    expansion: library.expansion,
    ...(library.composite ? { composite: library.composite } : {}),
    source: 'Douglass & Thrash Table 14.5 weight; GO 95 Table 23 strength; library moduli',
  };
}

/** The handbook's design condition: 6300 lb initial at 60 °F, creep allowance 21 °C (derived, REFERENCES). */
export function handbookDesign(overrides: Partial<SectionDesign> = {}): SectionDesign {
  return {
    basis: {
      kind: 'tension',
      horizontalTension: 6300 * POUND_FORCE,
      referenceTemperature: SIXTY_F,
      state: 'initial',
      creepOffset: 21,
    },
    maxDesignTemperature: 100,
    terrainCategory: 2,
    ...overrides,
  };
}

export interface Fixture {
  records: JudgementRecords;
  section: SectionRecord;
  span: SpanRecord;
  wireA: WireRecord;
  wireB: WireRecord;
  addReading: (wire: WireRecord, measurement: Measurement, temperature?: number) => ReadingRecord;
}

/** One section, one level 700 ft span 20 m up over level ground at 0 m with 6 m required clearance. */
export function drakeLine(
  design: SectionDesign | null = handbookDesign(),
  units: UnitSystem = 'metric',
): Fixture {
  const line: LineRecord = { ...META, id: testId(), name: 'Test line', unitSystem: units };
  const section: SectionRecord = {
    ...META,
    id: testId(),
    lineId: line.id,
    name: 'Str 1 to 2',
    conductor: drakeSpec(),
    ...(design ? { design } : {}),
  };
  const near = testId();
  const far = testId();
  const span: SpanRecord = {
    ...META,
    id: testId(),
    lineId: line.id,
    sectionId: section.id,
    nearStructureId: near,
    farStructureId: far,
    length: 700 * FOOT,
    nearAttachmentElevation: 20,
    farAttachmentElevation: 20,
    nearGroundElevation: 0,
    farGroundElevation: 0,
    requiredClearance: 6,
  };
  const wire = (label: string): WireRecord => ({
    ...META,
    id: testId(),
    lineId: line.id,
    spanId: span.id,
    label,
    nearOffset: 0,
    farOffset: 0,
  });
  const wireA = wire('A');
  const wireB = wire('B');
  const records: JudgementRecords = {
    line,
    sections: [section],
    spans: [span],
    wires: [wireA, wireB],
    readings: [],
  };
  let minute = 0;
  const addReading = (target: WireRecord, measurement: Measurement, temperature = SIXTY_F): ReadingRecord => {
    minute += 1;
    const reading: ReadingRecord = {
      ...META,
      id: testId(),
      lineId: line.id,
      spanId: span.id,
      wireId: target.id,
      measurement,
      conductorTemperature: temperature,
      takenAt: `2026-05-14T09:${String(minute).padStart(2, '0')}:00.000Z`,
      inspector: 'Test',
    };
    records.readings.push(reading);
    return reading;
  };
  return { records, section, span, wireA, wireB, addReading };
}
