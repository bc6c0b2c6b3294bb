import { openDB } from 'idb';
import { describe, expect, it } from 'vitest';
import type { RejectedRecord } from '../../../web/storage/store';
import {
  LINE_ID,
  SPAN_ID,
  sampleLine,
  sampleReading,
  sampleSpan,
  sampleWire,
  testUuid,
} from '../../core/records/samples';
import { freshName, openTestStore } from './test-store';

/** Writes values straight into a store, bypassing validation, as a bug or a broken import might have. */
async function writeRaw(name: string, storeName: string, values: unknown[]): Promise<void> {
  const db = await openDB(name);
  const tx = db.transaction(storeName, 'readwrite');
  await Promise.all([...values.map((value) => tx.store.put(value)), tx.done]);
  db.close();
}

describe('corrupt records are set aside, the rest still load', () => {
  it('loadLine reports a corrupt span and reading, moves them to quarantine, and returns the others', async () => {
    const name = freshName();
    const reported: RejectedRecord[][] = [];
    (await openTestStore(name)).close();
    const secondSpan = { ...sampleSpan(), id: testUuid(60), length: 180 };
    await writeRaw(name, 'line', [sampleLine()]);
    await writeRaw(name, 'span', [{ ...sampleSpan(), length: 'far' }, secondSpan]);
    await writeRaw(name, 'wire', [sampleWire()]);
    await writeRaw(name, 'reading', [{ ...sampleReading(), conductorTemperature: null }]);

    const store = await openTestStore(name, { onRejected: (rejected) => reported.push(rejected) });
    const bundle = await store.loadLine(LINE_ID);
    expect(bundle?.spans).toStrictEqual([secondSpan]);
    expect(bundle?.wires).toStrictEqual([sampleWire()]);
    expect(bundle?.readings).toStrictEqual([]);
    const rejected = [...(bundle?.rejected ?? [])].sort((a, b) => a.kind.localeCompare(b.kind));
    expect(rejected.map(({ kind, key }) => [kind, key])).toStrictEqual([
      ['reading', sampleReading().id],
      ['span', SPAN_ID],
    ]);
    expect(rejected[0]?.issues).toMatch(/^conductorTemperature:/);
    expect(rejected[1]?.issues).toMatch(/^length:/);
    expect(reported).toStrictEqual([bundle?.rejected]);

    // Set aside, not lost: the values wait in quarantine with the reason, and the next load is clean.
    const quarantined = await store.listQuarantine();
    expect(quarantined.map((entry) => entry.key).sort()).toStrictEqual(
      [`reading/${sampleReading().id}`, `span/${SPAN_ID}`].sort(),
    );
    expect(quarantined.find((entry) => entry.store === 'span')?.value).toMatchObject({ length: 'far' });
    expect((await store.loadLine(LINE_ID))?.rejected).toStrictEqual([]);
    expect(reported).toHaveLength(1);
    store.close();
  });

  it('a corrupt line is left out of listLines and reported; valid lines still list', async () => {
    const name = freshName();
    (await openTestStore(name)).close();
    const good = { ...sampleLine(), id: testUuid(70), name: 'Good line' };
    await writeRaw(name, 'line', [{ ...sampleLine(), unitSystem: 'imperial' }, good]);
    const store = await openTestStore(name);
    const { lines, rejected } = await store.listLines();
    expect(lines).toStrictEqual([good]);
    expect(rejected.map(({ kind, key }) => [kind, key])).toStrictEqual([['line', LINE_ID]]);
    expect(rejected[0]?.issues).toMatch(/^unitSystem:/);
    store.close();
  });

  it('scanAll finds a child whose lineId is broken (invisible to loadLine) and a corrupt draft', async () => {
    const name = freshName();
    (await openTestStore(name)).close();
    await writeRaw(name, 'wire', [{ ...sampleWire(), lineId: 42 }]);
    await writeRaw(name, 'drafts', [{ key: 'reading:x', values: { sag: 2.3 }, savedAt: 'yesterday' }]);
    const store = await openTestStore(name);
    const rejected = await store.scanAll();
    expect(rejected.map(({ kind, key }) => `${kind}:${key}`).sort()).toStrictEqual(
      ['draft:reading:x', `wire:${sampleWire().id}`].sort(),
    );
    expect(await store.loadDraft('reading:x')).toBeUndefined();
    expect(await store.scanAll()).toStrictEqual([]);
    store.close();
  });
});

describe('drafts', () => {
  it('a draft saved before a reload is there after reopening, then cleared after saving the form', async () => {
    const name = freshName();
    const before = await openTestStore(name);
    const values = { method: 'midspan-sag', sag: '7,25', conductorTemperature: '31', notes: 'gusty' };
    const saved = await before.saveDraft(`reading:${testUuid(6)}`, values);
    before.close(); // the tab is killed here

    const after = await openTestStore(name);
    expect(await after.loadDraft(`reading:${testUuid(6)}`)).toStrictEqual(saved);
    expect((await after.listDrafts()).drafts).toStrictEqual([saved]);
    await after.clearDraft(`reading:${testUuid(6)}`);
    expect(await after.loadDraft(`reading:${testUuid(6)}`)).toBeUndefined();
    after.close();
  });

  it('saving a draft again replaces it and updates savedAt; drafts list newest first', async () => {
    const store = await openTestStore();
    const first = await store.saveDraft('a', { sag: '1' });
    await store.saveDraft('b', { sag: '2' });
    const again = await store.saveDraft('a', { sag: '1.5' });
    expect(again.savedAt > first.savedAt).toBe(true);
    expect((await store.listDrafts()).drafts.map((draft) => draft.key)).toStrictEqual(['a', 'b']);
    expect((await store.loadDraft('a'))?.values).toStrictEqual({ sag: '1.5' });
    store.close();
  });
});
