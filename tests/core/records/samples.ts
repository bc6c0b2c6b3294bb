// Invented records for tests: a small line with one section, two structures, a span, a wire and a reading.
import type {
  LineRecord,
  ReadingRecord,
  RecordMeta,
  SectionRecord,
  SpanRecord,
  StructureRecord,
  WireRecord,
} from '../../../core';

/** A valid, recognisable UUID (version 4, RFC variant) from a small number. */
export function testUuid(n: number): string {
  return `00000000-0000-4000-8000-${n.toString(16).padStart(12, '0')}`;
}

export const DEVICE = 'device-test-1';
export const T0 = '2026-05-14T08:30:00.000Z';

function meta(n: number): RecordMeta {
  return { id: testUuid(n), updatedAt: T0, revision: 1, deleted: false, deviceId: DEVICE };
}

export const LINE_ID = testUuid(1);
export const SECTION_ID = testUuid(2);
export const NEAR_ID = testUuid(3);
export const FAR_ID = testUuid(4);
export const SPAN_ID = testUuid(5);
export const WIRE_ID = testUuid(6);
export const READING_ID = testUuid(7);

export function sampleLine(): LineRecord {
  return { ...meta(1), name: 'Hollow Creek feeder 7', unitSystem: 'us', owner: 'Invented Rural Power' };
}

export function sampleSection(): SectionRecord {
  return {
    ...meta(2),
    lineId: LINE_ID,
    name: 'Str 1 – Str 2',
    conductor: {
      name: 'Drake 795 kcmil 26/7',
      diameter: 0.0281432,
      area: 4.6845e-4,
      weight: 15.951,
      ratedStrength: 138_784,
      modulus: 7.0e10,
      expansion: 18.9e-6,
      source: 'invented test figures',
    },
    design: {
      basis: {
        kind: 'tension',
        percentOfRated: 20,
        referenceTemperature: 15.5,
        state: 'initial',
        creepOffset: 21,
      },
      maxDesignTemperature: 75,
      terrainCategory: 2,
    },
  };
}

export function sampleStructure(n: 3 | 4): StructureRecord {
  return {
    ...meta(n),
    lineId: LINE_ID,
    label: n === 3 ? 'P-101' : 'P-102',
    order: n,
    position: { latitude: 46.2 + n / 1000, longitude: -117.1, accuracy: 4 },
    groundElevation: 300 + n,
    attachmentHeight: 12.2,
  };
}

export function sampleSpan(): SpanRecord {
  return {
    ...meta(5),
    lineId: LINE_ID,
    sectionId: SECTION_ID,
    nearStructureId: NEAR_ID,
    farStructureId: FAR_ID,
    length: 213.36,
    nearAttachmentElevation: 315.2,
    farAttachmentElevation: 318.9,
    groundPoints: [{ x: 100, elevation: 301.5 }],
    requiredClearance: 5.64,
  };
}

export function sampleWire(): WireRecord {
  return { ...meta(6), lineId: LINE_ID, spanId: SPAN_ID, label: 'B', nearOffset: 0, farOffset: -0.3 };
}

export function sampleReading(): ReadingRecord {
  return {
    ...meta(7),
    lineId: LINE_ID,
    spanId: SPAN_ID,
    wireId: WIRE_ID,
    measurement: { method: 'return-wave', returns: 3, seconds: 7.7 },
    taps: [0, 2.55, 5.13, 7.7],
    conductorTemperature: 24.5,
    ambientTemperature: 21,
    takenAt: '2026-05-14T08:29:12.000Z',
    location: { latitude: 46.203, longitude: -117.1 },
    inspector: 'R. Okafor',
    notes: 'calm, =SUM(A1) kept as text',
  };
}
