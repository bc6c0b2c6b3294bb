import { openDB } from 'idb';
import { afterEach, describe, expect, it } from 'vitest';
import { RECORD_KINDS, formatQuantity, parseQuantity, type RecordSet } from '../../../core';
import { RecordValidationError } from '../../../web/storage/errors';
import type { SpanlogStore } from '../../../web/storage/store';
import {
  LINE_ID,
  SPAN_ID,
  sampleLine,
  sampleReading,
  sampleSection,
  sampleSpan,
  sampleStructure,
  sampleWire,
  testUuid,
} from '../../core/records/samples';
import { freshName, openTestStore } from './test-store';

const open: SpanlogStore[] = [];
async function track(store: Promise<SpanlogStore>): Promise<SpanlogStore> {
  const opened = await store;
  open.push(opened);
  return opened;
}
afterEach(() => {
  for (const store of open.splice(0)) store.close();
});

function sampleSet(): RecordSet {
  return {
    line: [sampleLine()],
    section: [sampleSection()],
    structure: [sampleStructure(3), sampleStructure(4)],
    span: [sampleSpan()],
    wire: [sampleWire()],
    reading: [sampleReading()],
  };
}

function count(set: RecordSet): number {
  return RECORD_KINDS.reduce((sum, kind) => sum + set[kind].length, 0);
}

describe('save and remove', () => {
  it('a new record gets an id, revision 1, the time and this device; saving again adds one revision', async () => {
    const store = await track(openTestStore());
    const {
      id: _id,
      revision: _revision,
      updatedAt: _updatedAt,
      deviceId: _deviceId,
      ...content
    } = sampleLine();
    const created = await store.save('line', content);
    expect(created).toMatchObject({ revision: 1, deleted: false, deviceId: store.deviceId() });
    expect(created.id).toMatch(/^[0-9a-f-]{36}$/);
    const renamed = await store.save('line', { ...created, name: 'Hollow Creek feeder 7 (rebuilt)' });
    expect(renamed.revision).toBe(2);
    expect(renamed.updatedAt > created.updatedAt).toBe(true);
    expect(await store.get('line', created.id)).toStrictEqual(renamed);
  });

  it('refuses an invalid record with RecordValidationError naming the field, and writes nothing', async () => {
    const store = await track(openTestStore());
    const span = { ...sampleSpan(), length: -40 };
    const attempt = store.save('span', span);
    await expect(attempt).rejects.toBeInstanceOf(RecordValidationError);
    await expect(attempt).rejects.toMatchObject({ kind: 'span', recordId: SPAN_ID, issues: /length/ });
    expect(await store.get('span', SPAN_ID)).toBeUndefined();
  });

  it('remove writes a tombstone (revision + 1) that loadLine hides and exports keep; removing twice is a no-op', async () => {
    const store = await track(openTestStore());
    await store.putRaw(sampleSet());
    const tombstone = await store.remove('wire', sampleWire().id);
    expect(tombstone).toMatchObject({ deleted: true, revision: 2, deviceId: store.deviceId() });
    expect(await store.remove('wire', sampleWire().id)).toStrictEqual(tombstone);
    expect((await store.loadLine(LINE_ID))?.wires).toStrictEqual([]);
    expect((await store.loadLine(LINE_ID, { includeDeleted: true }))?.wires).toStrictEqual([tombstone]);
    expect((await store.exportAll()).records.wire).toStrictEqual([tombstone]);
    expect(await store.remove('wire', testUuid(404))).toBeUndefined();
  });

  it('a removed line is left out of listLines and loadLine', async () => {
    const store = await track(openTestStore());
    await store.putRaw(sampleSet());
    await store.remove('line', LINE_ID);
    expect((await store.listLines()).lines).toStrictEqual([]);
    expect(await store.loadLine(LINE_ID)).toBeUndefined();
    expect((await store.listLines({ includeDeleted: true })).lines).toHaveLength(1);
  });
});

describe('loadLine', () => {
  it('returns the line with all its records, structures by order', async () => {
    const store = await track(openTestStore());
    const set = sampleSet();
    set.structure.reverse();
    await store.putRaw(set);
    const bundle = await store.loadLine(LINE_ID);
    expect(bundle?.line).toStrictEqual(sampleLine());
    expect(bundle?.structures.map((structure) => structure.label)).toStrictEqual(['P-101', 'P-102']);
    expect(bundle?.sections).toStrictEqual([sampleSection()]);
    expect(bundle?.spans).toStrictEqual([sampleSpan()]);
    expect(bundle?.readings).toStrictEqual([sampleReading()]);
    expect(bundle?.rejected).toStrictEqual([]);
  });

  it('values typed in US units come back bit-identical after a reopen and show as typed', async () => {
    const name = freshName();
    const first = await openTestStore(name);
    const typed = { length: '700.00', near: '1034.12', far: '1046.25', clearance: '18.50' };
    const si = (text: string): number => {
      const parsed = parseQuantity(text, 'length', 'us');
      if (!parsed.ok) throw new Error(parsed.message);
      return parsed.value;
    };
    const span = {
      ...sampleSpan(),
      length: si(typed.length),
      nearAttachmentElevation: si(typed.near),
      farAttachmentElevation: si(typed.far),
      requiredClearance: si(typed.clearance),
    };
    await first.putRaw({ span: [span] });
    first.close();
    const second = await track(openTestStore(name));
    const stored = await second.get('span', SPAN_ID);
    expect(stored).toStrictEqual(span);
    expect(Object.is(stored?.length, span.length)).toBe(true);
    expect(formatQuantity(stored?.length ?? Number.NaN, 'length', 'us').value).toBe(typed.length);
    expect(formatQuantity(stored?.farAttachmentElevation ?? Number.NaN, 'length', 'us').value).toBe(
      typed.far,
    );
    expect(formatQuantity(stored?.nearAttachmentElevation ?? Number.NaN, 'length', 'metric').value).toBe(
      '315.20',
    );
  });
});

describe('putRaw (import and sync)', () => {
  it('export → import into an empty database gives identical records, and importing twice changes nothing', async () => {
    const source = await track(openTestStore());
    await source.putRaw(sampleSet());
    const exported = await source.exportAll();
    const target = await track(openTestStore());
    expect(await target.putRaw(exported.records)).toStrictEqual({
      written: count(sampleSet()),
      unchanged: 0,
    });
    expect((await target.exportAll()).records).toStrictEqual(exported.records);
    expect(await target.putRaw(exported.records)).toStrictEqual({
      written: 0,
      unchanged: count(sampleSet()),
    });
    expect((await target.exportAll()).records).toStrictEqual(exported.records);
  });

  it('one invalid record in a batch throws, naming it, and nothing of the batch is written', async () => {
    const store = await track(openTestStore());
    const set = sampleSet();
    const badReading = {
      ...sampleReading(),
      id: testUuid(77),
      measurement: { method: 'midspan-sag', sag: 'two' },
    };
    const attempt = store.putRaw({ ...set, reading: [sampleReading(), badReading] });
    await expect(attempt).rejects.toMatchObject({
      name: 'RecordValidationError',
      kind: 'reading',
      recordId: testUuid(77),
      index: 1,
      issues: /measurement\.sag/,
    });
    expect(count((await store.exportAll()).records)).toBe(0);
  });

  it('a higher revision replaces the stored record, a lower one is ignored', async () => {
    const store = await track(openTestStore());
    await store.putRaw({ line: [{ ...sampleLine(), revision: 3, name: 'third' }] });
    expect(await store.putRaw({ line: [{ ...sampleLine(), revision: 2, name: 'second' }] })).toStrictEqual({
      written: 0,
      unchanged: 1,
    });
    expect((await store.get('line', LINE_ID))?.name).toBe('third');
    await store.putRaw({ line: [{ ...sampleLine(), revision: 4, name: 'fourth' }] });
    expect((await store.get('line', LINE_ID))?.name).toBe('fourth');
  });

  it('within one batch, the newest copy of a record wins whatever its position', async () => {
    const store = await track(openTestStore());
    const newer = { ...sampleLine(), revision: 5, name: 'newer' };
    await store.putRaw({ line: [newer, { ...sampleLine(), revision: 4, name: 'older' }] });
    expect(await store.get('line', LINE_ID)).toStrictEqual(newer);
  });

  it('exportLine holds only that line and its records, tombstones included', async () => {
    const store = await track(openTestStore());
    const other = { ...sampleLine(), id: testUuid(50), name: 'Other line' };
    const otherStructure = { ...sampleStructure(3), id: testUuid(51), lineId: other.id };
    await store.putRaw({ ...sampleSet(), line: [sampleLine(), other], structure: [otherStructure] });
    await store.remove('reading', sampleReading().id);
    const exported = await store.exportLine(LINE_ID);
    expect(exported.records.line).toStrictEqual([sampleLine()]);
    expect(exported.records.structure).toStrictEqual([]);
    expect(exported.records.reading).toMatchObject([{ deleted: true, revision: 2 }]);
    expect((await store.exportLine(other.id)).records.structure).toStrictEqual([otherStructure]);
  });
});

describe('device id and persistence', () => {
  it('keeps the same device id across reopening', async () => {
    const name = freshName();
    const first = await openTestStore(name);
    const deviceId = first.deviceId();
    first.close();
    const second = await track(openTestStore(name, { newId: () => testUuid(9999) }));
    expect(second.deviceId()).toBe(deviceId);
  });

  it('requestPersistence reports what the browser granted, and false without a storage API', async () => {
    const store = await track(openTestStore());
    let asked = 0;
    const granting = {
      persisted: () => Promise.resolve(false),
      persist: () => {
        asked += 1;
        return Promise.resolve(true);
      },
    };
    expect(await store.requestPersistence(granting)).toBe(true);
    expect(asked).toBe(1);
    expect(await store.requestPersistence({ persist: () => Promise.resolve(false) })).toBe(false);
    expect(await store.requestPersistence({})).toBe(false);
    expect(
      await store.requestPersistence({
        persisted: () => Promise.resolve(true),
        persist: () => Promise.reject(new Error('not asked')),
      }),
    ).toBe(true);
  });
});

it('openDB on the default fake factory sees the stores of the current version', async () => {
  const name = freshName();
  (await openTestStore(name)).close();
  const db = await openDB(name);
  expect(db.version).toBe(2);
  expect([...db.objectStoreNames].sort()).toStrictEqual(
    ['drafts', 'line', 'meta', 'quarantine', 'reading', 'section', 'span', 'structure', 'wire'].sort(),
  );
  db.close();
});
