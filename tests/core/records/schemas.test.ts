import { describe, expect, it } from 'vitest';
import {
  RECORD_KINDS,
  RECORD_SCHEMAS,
  bumpRecord,
  designBasisSchema,
  incomingWins,
  isRecordKind,
  measurementSchema,
  newRecordMeta,
  validateRecord,
  type Measurement,
} from '../../../core';
import {
  DEVICE,
  T0,
  sampleLine,
  sampleReading,
  sampleSection,
  sampleSpan,
  sampleStructure,
  sampleWire,
  testUuid,
} from './samples';

const SAMPLES = {
  line: sampleLine(),
  section: sampleSection(),
  structure: sampleStructure(3),
  span: sampleSpan(),
  wire: sampleWire(),
  reading: sampleReading(),
};

describe('record schemas', () => {
  it.each(RECORD_KINDS)('a valid %s record parses back to an equal value', (kind) => {
    const parsed = RECORD_SCHEMAS[kind].parse(SAMPLES[kind]);
    expect(parsed).toStrictEqual(SAMPLES[kind]);
  });

  it.each(RECORD_KINDS)('a %s record without its meta fields is refused, naming the field', (kind) => {
    const { revision: _revision, ...withoutRevision } = SAMPLES[kind];
    const checked = validateRecord(kind, withoutRevision);
    expect(checked.ok).toBe(false);
    if (!checked.ok) expect(checked.issues).toMatch(/^revision:/);
  });

  it('refuses non-finite numbers and names the path (NaN must never reach storage)', () => {
    const span = { ...sampleSpan(), length: Number.NaN };
    const checked = validateRecord('span', span);
    expect(checked).toMatchObject({ ok: false });
    if (!checked.ok) expect(checked.issues).toContain('length');
    const section = sampleSection();
    const infinite = { ...section, conductor: { ...section.conductor, weight: Number.POSITIVE_INFINITY } };
    const second = validateRecord('section', infinite);
    if (second.ok) throw new Error('infinite weight accepted');
    expect(second.issues).toContain('conductor.weight');
  });

  it('refuses a revision of 0, a non-UUID id and a date that is not ISO 8601', () => {
    expect(validateRecord('line', { ...sampleLine(), revision: 0 }).ok).toBe(false);
    expect(validateRecord('line', { ...sampleLine(), id: 'line-1' }).ok).toBe(false);
    expect(validateRecord('line', { ...sampleLine(), updatedAt: '14/05/2026' }).ok).toBe(false);
  });

  it('accepts every core Measurement method and refuses an unknown one', () => {
    const all: Measurement[] = [
      { method: 'midspan-sag', sag: 2.31 },
      { method: 'offset-sag', x: 61.2, sag: 1.97 },
      { method: 'sight-line', nearDrop: 2.1, farDrop: 2.6 },
      { method: 'sight-angle', nearDrop: 1.5, angle: 0.0123 },
      { method: 'return-wave', returns: 3, seconds: 7.7 },
      {
        method: 'surveyed-points',
        points: [
          { x: 10, z: -1 },
          { x: 50, z: -2.2 },
          { x: 90, z: -1.4 },
        ],
      },
    ];
    for (const measurement of all) expect(measurementSchema.parse(measurement)).toStrictEqual(measurement);
    expect(measurementSchema.safeParse({ method: 'dynamometer', tension: 1000 }).success).toBe(false);
  });

  it('a tension design basis needs exactly one of horizontal tension and % of rated strength', () => {
    const basis = { kind: 'tension', referenceTemperature: 15.5, state: 'final', creepOffset: 0 } as const;
    expect(designBasisSchema.safeParse(basis).success).toBe(false);
    expect(designBasisSchema.safeParse({ ...basis, horizontalTension: 25_000 }).success).toBe(true);
    expect(designBasisSchema.safeParse({ ...basis, percentOfRated: 18 }).success).toBe(true);
    expect(
      designBasisSchema.safeParse({ ...basis, percentOfRated: 18, horizontalTension: 25_000 }).success,
    ).toBe(false);
  });

  it('a design table needs two rows or more, each temperature once', () => {
    const row = (temperature: number, sag: number) => ({ temperature, sag });
    expect(designBasisSchema.safeParse({ kind: 'table', rows: [row(15, 4.1)] }).success).toBe(false);
    expect(designBasisSchema.safeParse({ kind: 'table', rows: [row(15, 4.1), row(15, 4.3)] }).success).toBe(
      false,
    );
    expect(designBasisSchema.safeParse({ kind: 'table', rows: [row(15, 4.1), row(30, 4.6)] }).success).toBe(
      true,
    );
  });

  it('drops fields the schema does not know (forms may carry UI state)', () => {
    const parsed = RECORD_SCHEMAS.wire.parse({ ...sampleWire(), selected: true });
    expect('selected' in parsed).toBe(false);
  });

  it('isRecordKind recognises the six kinds only', () => {
    expect(RECORD_KINDS.every(isRecordKind)).toBe(true);
    expect(isRecordKind('drafts')).toBe(false);
    expect(isRecordKind(3)).toBe(false);
  });
});

describe('record meta helpers', () => {
  it('newRecordMeta starts at revision 1, live, with the given id, time and device', () => {
    expect(newRecordMeta(DEVICE, T0, testUuid(99))).toStrictEqual({
      id: testUuid(99),
      updatedAt: T0,
      revision: 1,
      deleted: false,
      deviceId: DEVICE,
    });
  });

  it('bumpRecord adds one revision, restamps time and device, and leaves the input alone', () => {
    const line = sampleLine();
    const bumped = bumpRecord(line, 'device-2', '2026-05-15T10:00:00.000Z');
    expect(bumped).toStrictEqual({
      ...line,
      revision: 2,
      updatedAt: '2026-05-15T10:00:00.000Z',
      deviceId: 'device-2',
    });
    expect(line.revision).toBe(1);
  });
});

describe('incomingWins (merge by revision)', () => {
  const stored = sampleLine();
  it('takes a higher revision and keeps against a lower one', () => {
    expect(incomingWins(stored, { ...stored, revision: 2 })).toBe(true);
    expect(incomingWins({ ...stored, revision: 3 }, { ...stored, revision: 2 })).toBe(false);
  });
  it('is a no-op for the same change (idempotent import)', () => {
    expect(incomingWins(stored, { ...stored })).toBe(false);
  });
  it('orders concurrent changes with equal revisions the same way on every replica', () => {
    const a = { ...stored, revision: 2, updatedAt: '2026-05-14T09:00:00.000Z', deviceId: 'phone-a' };
    const b = { ...stored, revision: 2, updatedAt: '2026-05-14T09:05:00.000Z', deviceId: 'phone-b' };
    expect(incomingWins(a, b)).toBe(true);
    expect(incomingWins(b, a)).toBe(false);
    const sameTime = { ...a, deviceId: 'phone-c' };
    expect(incomingWins(a, sameTime)).not.toBe(incomingWins(sameTime, a));
  });
  it('takes anything when nothing is stored', () => {
    expect(incomingWins(undefined, stored)).toBe(true);
  });
});
