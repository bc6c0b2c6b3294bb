// JSON backup out and back in, through the app's own storage on fake-indexeddb (an in-memory IndexedDB from the
// npm registry that follows the W3C Indexed Database API). Expectations are the rules: identical records
// after export → import into an empty database, nothing changed by a file with one bad record, and a second
// import of the same file changing nothing (merge by id and revision).
import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import {
  BACKUP_FORMAT,
  BACKUP_RECORDS_PER_PART,
  BACKUP_VERSION,
  buildBackup,
  RECORD_KINDS,
  backupJsonJob,
  bumpRecord,
  joinExportJob,
  parseBackup,
  selectLineRecords,
  writeBackupJson,
  type RecordSet,
} from '../../../core';
import { openStore, type SpanlogStore } from '../../../web/storage/store';
import { fixtureLine, fixtureUuid } from '../exports/line-fixture';

let databases = 0;
async function emptyStore(): Promise<SpanlogStore> {
  databases += 1;
  let ids = 90_000;
  return openStore({
    name: `spanlog-backup-test-${databases}`,
    now: () => '2026-05-15T10:00:00.000Z',
    newId: () => fixtureUuid(ids++),
  });
}

function sortById(records: RecordSet): RecordSet {
  const sorted = { ...records };
  for (const kind of RECORD_KINDS) {
    (sorted[kind] as { id: string }[]) = [...records[kind]].sort((a, b) => a.id.localeCompare(b.id));
  }
  return sorted;
}

const EXPORTED_AT = '2026-05-15T09:00:00.000Z';

/** Two lines, one with a tombstoned reading and a record at revision 3. */
function twoLines(): RecordSet {
  const first = fixtureLine({ spans: 3 });
  const second = fixtureLine({ spans: 2, name: 'Second line', unitSystem: 'us' });
  // The second fixture reuses the same counter ids; shift them so both lines can live in one database.
  const shifted = JSON.parse(JSON.stringify(second).replaceAll('0000f1f1-', '0000f2f2-')) as RecordSet;
  const merged: RecordSet = { line: [], section: [], structure: [], span: [], wire: [], reading: [] };
  for (const kind of RECORD_KINDS) (merged[kind] as unknown[]) = [...first[kind], ...shifted[kind]];
  const reading = merged.reading[0];
  if (reading)
    merged.reading[0] = { ...bumpRecord(reading, 'device-x', '2026-05-14T10:00:00.000Z'), deleted: true };
  const span = merged.span[1];
  if (span)
    merged.span[1] = bumpRecord(
      bumpRecord(span, 'device-y', '2026-05-14T11:00:00.000Z'),
      'device-y',
      '2026-05-14T12:00:00.000Z',
    );
  return merged;
}

describe('JSON backup: export → import', () => {
  it('writes the versioned envelope, and the streamed pieces join into the same JSON', () => {
    const records = twoLines();
    const text = writeBackupJson(records, EXPORTED_AT);
    const data = JSON.parse(text) as {
      format: string;
      version: number;
      exportedAt: string;
      records: Record<string, unknown[]>;
    };
    expect(data.format).toBe(BACKUP_FORMAT);
    expect(data.version).toBe(BACKUP_VERSION);
    expect(data.exportedAt).toBe(EXPORTED_AT);
    expect(Object.keys(data.records)).toStrictEqual([
      'lines',
      'sections',
      'structures',
      'spans',
      'wires',
      'readings',
    ]);
    expect(data.records.readings).toHaveLength(records.reading.length);
    const job = backupJsonJob(records, EXPORTED_AT);
    const parts = [...job.parts];
    expect(parts).toHaveLength(job.total);
    expect(parts.join('')).toBe(text);
    expect(joinExportJob(backupJsonJob(records, EXPORTED_AT))).toBe(text);
  });

  it('a line larger than one piece still joins into JSON equal to the backup object', () => {
    const records = fixtureLine({ spans: 200 });
    expect(records.reading.length).toBeGreaterThan(2 * BACKUP_RECORDS_PER_PART);
    const job = backupJsonJob(records, EXPORTED_AT);
    const parts = [...job.parts];
    expect(parts).toHaveLength(job.total);
    expect(JSON.parse(parts.join(''))).toStrictEqual(
      JSON.parse(JSON.stringify(buildBackup(records, EXPORTED_AT))),
    );
  });

  it('export of everything, imported into an empty database, gives identical records (tombstones too)', async () => {
    const source = await emptyStore();
    const records = twoLines();
    await source.putRaw(records);
    const exported = await source.exportAll();
    expect(exported.rejected).toStrictEqual([]);
    const text = writeBackupJson(exported.records, EXPORTED_AT);

    const target = await emptyStore();
    const parsed = parseBackup(text);
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const applied = await target.putRaw(parsed.records);
    expect(applied).toStrictEqual({ written: Object.values(records).flat().length, unchanged: 0 });
    const back = await target.exportAll();
    expect(sortById(back.records)).toStrictEqual(sortById(records));
    expect(back.records.reading.filter((reading) => reading.deleted)).toHaveLength(1);
    expect(back.records.span.find((span) => span.revision === 3)).toBeDefined();
    source.close();
    target.close();
  });

  it('a one-line backup holds that line only, and imports into an empty database identically', async () => {
    const records = twoLines();
    const lineId = records.line[1]?.id ?? '';
    const source = await emptyStore();
    await source.putRaw(records);
    const { records: lineRecords } = await source.exportLine(lineId);
    expect(lineRecords).toStrictEqual(sortLike(lineRecords, selectLineRecords(records, lineId)));
    const parsed = parseBackup(writeBackupJson(lineRecords, EXPORTED_AT));
    expect(parsed.ok && parsed.lineIds).toStrictEqual([lineId]);
    const target = await emptyStore();
    if (parsed.ok) await target.putRaw(parsed.records);
    expect(sortById((await target.exportAll()).records)).toStrictEqual(
      sortById(selectLineRecords(records, lineId)),
    );
    source.close();
    target.close();
  });

  it('importing the same file twice changes nothing the second time', async () => {
    const records = twoLines();
    const text = writeBackupJson(records, EXPORTED_AT);
    const store = await emptyStore();
    const parsed = parseBackup(text);
    if (!parsed.ok) throw new Error(parsed.problem.message);
    await store.putRaw(parsed.records);
    const before = await store.exportAll();
    const again = parseBackup(text);
    if (!again.ok) throw new Error(again.problem.message);
    const second = await store.putRaw(again.records);
    expect(second.written).toBe(0);
    expect(second.unchanged).toBe(Object.values(records).flat().length);
    expect(sortById((await store.exportAll()).records)).toStrictEqual(sortById(before.records));
    store.close();
  });

  it('an older copy in the file does not overwrite a newer stored revision', async () => {
    const records = twoLines();
    const store = await emptyStore();
    const span = records.span[0];
    if (!span) throw new Error('fixture without spans');
    const newer = bumpRecord({ ...span, length: 222.5 }, 'device-z', '2026-05-16T08:00:00.000Z');
    await store.putRaw({ span: [newer] });
    const parsed = parseBackup(writeBackupJson(records, EXPORTED_AT));
    if (!parsed.ok) throw new Error(parsed.problem.message);
    await store.putRaw(parsed.records);
    expect((await store.get('span', span.id))?.length).toBe(222.5);
    store.close();
  });
});

function sortLike(actual: RecordSet, expected: RecordSet): RecordSet {
  const order = new Map<string, number>();
  for (const kind of RECORD_KINDS) actual[kind].forEach((record, index) => order.set(record.id, index));
  const sorted = { ...expected };
  for (const kind of RECORD_KINDS) {
    (sorted[kind] as { id: string }[]) = [...expected[kind]].sort(
      (a, b) => (order.get(a.id) ?? 0) - (order.get(b.id) ?? 0),
    );
  }
  return sorted;
}

describe('JSON backup: refusals change nothing', () => {
  function backupWith(edit: (data: { records: Record<string, Record<string, unknown>[]> }) => void): string {
    const data = JSON.parse(writeBackupJson(twoLines(), EXPORTED_AT)) as {
      records: Record<string, Record<string, unknown>[]>;
    };
    edit(data);
    return JSON.stringify(data);
  }

  it('one bad record: the message names kind, position, id, field and problem; the database is unchanged', async () => {
    const records = twoLines();
    const store = await emptyStore();
    const firstLine = selectLineRecords(records, records.line[0]?.id ?? '');
    await store.putRaw(firstLine);
    const before = await store.exportAll();

    const badId = records.reading[4]?.id ?? '';
    const text = backupWith((data) => {
      const reading = data.records.readings?.[4];
      if (reading) reading.measurement = { method: 'midspan-sag', sag: 'about a metre' };
    });
    const parsed = parseBackup(text);
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.problem).toMatchObject({
      code: 'record-invalid',
      kind: 'reading',
      index: 4,
      id: badId,
      path: 'measurement.sag',
    });
    expect(parsed.problem.message).toContain(`reading record #5 (id ${badId})`);
    expect(parsed.problem.message).toContain('measurement.sag');
    expect(parsed.problem.message).toMatch(/Nothing was imported\.$/);
    // The caller writes nothing on a refusal; the store is as it was.
    expect(sortById((await store.exportAll()).records)).toStrictEqual(sortById(before.records));
    // And storage's own all-or-nothing putRaw refuses the raw file's records without writing any either.
    const raw = JSON.parse(text) as { records: Record<string, unknown[]> };
    await expect(
      store.putRaw({
        line: raw.records.lines ?? [],
        section: raw.records.sections ?? [],
        structure: raw.records.structures ?? [],
        span: raw.records.spans ?? [],
        wire: raw.records.wires ?? [],
        reading: raw.records.readings ?? [],
      }),
    ).rejects.toMatchObject({ name: 'RecordValidationError', kind: 'reading' });
    expect(sortById((await store.exportAll()).records)).toStrictEqual(sortById(before.records));
    store.close();
  });

  it('names the envelope problems with their codes', () => {
    const truncated = writeBackupJson(twoLines(), EXPORTED_AT).slice(0, 400);
    const notJson = parseBackup(truncated);
    expect(!notJson.ok && notJson.problem.code).toBe('not-json');
    const other = parseBackup('{"type": "FeatureCollection", "features": []}');
    expect(!other.ok && other.problem.code).toBe('not-a-backup');
    const newer = parseBackup(backupWith((data) => Object.assign(data, { version: 2 })));
    expect(!newer.ok && newer.problem.code).toBe('version-unsupported');
    const unknown = parseBackup(backupWith((data) => Object.assign(data.records, { photos: [] })));
    expect(!unknown.ok && unknown.problem.code).toBe('unknown-kind');
    const notList = parseBackup(backupWith((data) => Object.assign(data.records, { spans: {} })));
    expect(!notList.ok && notList.problem).toMatchObject({ code: 'records-missing', kind: 'span' });
  });

  it('refuses a repeated id and a reading whose wire is not in the file', () => {
    const repeated = parseBackup(
      backupWith((data) => {
        const first = data.records.structures?.[0];
        if (first) data.records.structures?.push({ ...first });
      }),
    );
    expect(!repeated.ok && repeated.problem).toMatchObject({ code: 'duplicate-id', kind: 'structure' });
    const dangling = parseBackup(
      backupWith((data) => {
        const reading = data.records.readings?.[0];
        if (reading) reading.wireId = fixtureUuid(999_999);
      }),
    );
    expect(!dangling.ok && dangling.problem).toMatchObject({
      code: 'dangling-reference',
      kind: 'reading',
      path: 'wireId',
    });
  });

  it('reads a file that starts with a byte-order mark', () => {
    const parsed = parseBackup(`\ufeff${writeBackupJson(twoLines(), EXPORTED_AT)}`);
    expect(parsed.ok).toBe(true);
  });
});
