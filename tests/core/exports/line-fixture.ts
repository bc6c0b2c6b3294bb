// An invented line for the export tests and the bench: structures in a row with positions, two tension sections,
// three wires per span and readings by every method. Ids are counters made into UUIDs, so files are repeatable.
import type {
  InspectionLogInput,
  LineRecord,
  ReadingRecord,
  ReadingResult,
  RecordMeta,
  RecordSet,
  SectionRecord,
  SpanRecord,
  StructureRecord,
  UnitSystem,
  WireRecord,
} from '../../../core';
import { findConductor } from '../../../core';

/** A valid version-4 UUID from a counter (prefix keeps fixtures apart from other tests' ids). */
export function fixtureUuid(n: number): string {
  return `0000f1f1-0000-4000-8000-${n.toString(16).padStart(12, '0')}`;
}

export const FIXTURE_TIME = '2026-05-14T08:30:00.000Z';
export const FIXTURE_DEVICE = 'device-fixture';

export interface FixtureOptions {
  spans: number;
  unitSystem?: UnitSystem;
  /** Readings per wire (default 1). */
  readingsPerWire?: number;
  /** Notes cycled over the readings (default plain text). */
  notes?: readonly string[];
  /** Line name (default with non-ASCII letters). */
  name?: string;
}

const METHODS: readonly ReadingRecord['measurement'][] = [
  { method: 'midspan-sag', sag: 1.2345 },
  { method: 'offset-sag', x: 31.25, sag: 1.0625 },
  { method: 'sight-line', nearDrop: 2.125, farDrop: 1.875 },
  { method: 'sight-angle', nearDrop: 2.5, angle: 0.0375 },
  { method: 'return-wave', returns: 3, seconds: 4.56 },
  {
    method: 'surveyed-points',
    points: [
      { x: 20, z: -1.1 },
      { x: 50, z: -1.9 },
      { x: 80, z: -1.3 },
    ],
  },
];

export function fixtureLine(options: FixtureOptions): RecordSet {
  let counter = 1;
  const meta = (): RecordMeta => ({
    id: fixtureUuid(counter++),
    updatedAt: FIXTURE_TIME,
    revision: 1,
    deleted: false,
    deviceId: FIXTURE_DEVICE,
  });
  const drake = findConductor('acsr-drake');
  const partridge = findConductor('partridge');
  if (!drake || !partridge) throw new Error('library conductors missing');
  const spec = (c: NonNullable<typeof drake>): SectionRecord['conductor'] => ({
    name: `${c.name} ${c.sizeLabel}`,
    diameter: c.diameter,
    area: c.area,
    weight: c.weight,
    ratedStrength: c.ratedStrength,
    modulus: c.modulus,
    expansion: c.expansion,
    source: c.source,
    libraryId: c.id,
  });
  const line: LineRecord = {
    ...meta(),
    name: options.name ?? 'Łódź–Süd feeder 日本',
    unitSystem: options.unitSystem ?? 'metric',
    owner: 'Invented Grid Co., "North"',
  };
  const sections: SectionRecord[] = [
    { ...meta(), lineId: line.id, name: 'Mühlbach, west', conductor: spec(drake) },
    { ...meta(), lineId: line.id, name: 'Ridge "A"', conductor: spec(partridge) },
  ];
  const structures: StructureRecord[] = [];
  for (let k = 0; k <= options.spans; k += 1) {
    structures.push({
      ...meta(),
      lineId: line.id,
      label: `S-${k + 1}`,
      order: k + 1,
      position: { latitude: 51.7592 + k * 0.0009, longitude: 19.456 - k * 0.0011 },
      groundElevation: 200 + (k % 7) * 1.5,
      attachmentHeight: 12,
    });
  }
  const spans: SpanRecord[] = [];
  const wires: WireRecord[] = [];
  const readings: ReadingRecord[] = [];
  const notes = options.notes ?? ['plain note'];
  let readingCount = 0;
  for (let k = 0; k < options.spans; k += 1) {
    const near = structures[k];
    const far = structures[k + 1];
    if (!near || !far) throw new Error('structure missing');
    const span: SpanRecord = {
      ...meta(),
      lineId: line.id,
      sectionId: (k < options.spans / 2 ? sections[0] : sections[1])?.id ?? '',
      nearStructureId: near.id,
      farStructureId: far.id,
      length: 100 + (k % 5) * 12.5,
      nearAttachmentElevation: (near.groundElevation ?? 0) + 12,
      farAttachmentElevation: (far.groundElevation ?? 0) + 12,
      nearGroundElevation: near.groundElevation ?? 0,
      farGroundElevation: far.groundElevation ?? 0,
      requiredClearance: 6.1,
    };
    spans.push(span);
    for (const label of ['A', 'B', 'C']) {
      const wire: WireRecord = {
        ...meta(),
        lineId: line.id,
        spanId: span.id,
        label,
        nearOffset: 0,
        farOffset: 0,
      };
      wires.push(wire);
      for (let r = 0; r < (options.readingsPerWire ?? 1); r += 1) {
        const measurement = METHODS[readingCount % METHODS.length] ?? { method: 'midspan-sag', sag: 1 };
        const note = notes[readingCount % notes.length];
        readings.push({
          ...meta(),
          lineId: line.id,
          spanId: span.id,
          wireId: wire.id,
          measurement,
          conductorTemperature: 17.25 + (readingCount % 11) * 1.5,
          ambientTemperature: 14.5,
          takenAt: new Date(Date.UTC(2026, 4, 14, 9, 0, readingCount)).toISOString(),
          location: { latitude: 51.7592 + k * 0.0009, longitude: 19.456 - k * 0.0011 },
          inspector: readingCount % 2 === 0 ? 'Zoë Ångström' : '=cmd|calc',
          ...(note === undefined ? {} : { notes: note }),
        });
        readingCount += 1;
      }
    }
  }
  return {
    line: [line],
    section: sections,
    structure: structures,
    span: spans,
    wire: wires,
    reading: readings,
  };
}

/** Invented result figures (SI) that differ per reading, so a swapped column or row shows. */
export function fixtureResult(reading: ReadingRecord): ReadingResult {
  const n = Number.parseInt(reading.id.slice(-6), 16);
  const verdicts = ['within', 'too-slack', 'too-tight', 'recheck'];
  return {
    horizontalTension: 20_000 + n * 13.37,
    sag: 1.1 + (n % 17) * 0.0123,
    designSag: 1.15 + (n % 13) * 0.011,
    designHorizontalTension: 21_000 + (n % 9) * 101,
    sagDeviation: -0.2 + (n % 23) * 0.0171,
    percentOfRatedStrength: 14 + (n % 19) * 0.37,
    clearanceMargin: -0.5 + (n % 29) * 0.113,
    verdict: verdicts[n % 4] ?? 'within',
    verdictReason: `Deviation ${n % 23} mm, "quoted", with comma`,
  };
}

/** The log input for the single line of a fixture set. */
export function fixtureLogInput(records: RecordSet, withResults = true): InspectionLogInput {
  const line = records.line[0];
  if (!line) throw new Error('no line');
  return {
    line,
    sections: records.section,
    structures: records.structure,
    spans: records.span,
    wires: records.wire,
    readings: records.reading,
    ...(withResults ? { resultFor: ({ reading }) => fixtureResult(reading) } : {}),
  };
}
