import { openDB } from 'idb';
import { describe, expect, it } from 'vitest';
import {
  LINE_ID,
  WIRE_ID,
  sampleLine,
  sampleReading,
  sampleSection,
  sampleSpan,
  sampleWire,
} from '../../core/records/samples';
import { freshName, openTestStore } from './test-store';

/**
 * Builds a database exactly as schema version 1 left it, written out here by hand (not with the app's upgrade
 * code) so that the test keeps describing the old layout even if someone edits the upgrade steps.
 */
async function createVersion1Database(name: string): Promise<void> {
  const db = await openDB(name, 1, {
    upgrade(database) {
      database.createObjectStore('line', { keyPath: 'id' });
      for (const kind of ['section', 'structure', 'span', 'wire', 'reading']) {
        database.createObjectStore(kind, { keyPath: 'id' }).createIndex('by-line', 'lineId');
      }
      database.createObjectStore('meta', { keyPath: 'key' });
    },
  });
  const tx = db.transaction(['line', 'section', 'span', 'wire', 'reading', 'meta'], 'readwrite');
  await Promise.all([
    tx.objectStore('line').put(sampleLine()),
    tx.objectStore('section').put(sampleSection()),
    tx.objectStore('span').put(sampleSpan()),
    tx.objectStore('wire').put(sampleWire()),
    tx.objectStore('reading').put(sampleReading()),
    tx.objectStore('meta').put({ key: 'deviceId', value: 'phone-from-v1' }),
    tx.done,
  ]);
  db.close();
}

describe('schema upgrade', () => {
  it('opens a version 1 database with its data intact and the version 2 stores and indexes added', async () => {
    const name = freshName();
    await createVersion1Database(name);

    const store = await openTestStore(name);
    expect(store.deviceId()).toBe('phone-from-v1');
    const bundle = await store.loadLine(LINE_ID);
    expect(bundle?.line).toStrictEqual(sampleLine());
    expect(bundle?.sections).toStrictEqual([sampleSection()]);
    expect(bundle?.spans).toStrictEqual([sampleSpan()]);
    expect(bundle?.wires).toStrictEqual([sampleWire()]);
    expect(bundle?.readings).toStrictEqual([sampleReading()]);
    expect(bundle?.rejected).toStrictEqual([]);
    // The version 2 drafts store works.
    await store.saveDraft('reading:new', { sag: '2,31' });
    expect((await store.loadDraft('reading:new'))?.values).toStrictEqual({ sag: '2,31' });
    store.close();

    const db = await openDB(name);
    expect(db.version).toBe(2);
    expect(db.objectStoreNames.contains('drafts')).toBe(true);
    expect(db.objectStoreNames.contains('quarantine')).toBe(true);
    const tx = db.transaction(['wire', 'reading'], 'readonly');
    expect([...tx.objectStore('reading').indexNames].sort()).toStrictEqual(['by-line', 'by-span', 'by-wire']);
    expect([...tx.objectStore('wire').indexNames].sort()).toStrictEqual(['by-line', 'by-span']);
    // The new indexes cover the records written before they existed.
    expect(await tx.objectStore('reading').index('by-wire').getAll(WIRE_ID)).toStrictEqual([sampleReading()]);
    await tx.done;
    db.close();
  });

  it('a fresh database and an upgraded one end with the same layout', async () => {
    const describeLayout = async (name: string) => {
      const db = await openDB(name);
      const names = [...db.objectStoreNames].sort();
      const tx = db.transaction(names, 'readonly');
      const layout = names.map((storeName) => {
        const objectStore = tx.objectStore(storeName);
        return { storeName, keyPath: objectStore.keyPath, indexes: [...objectStore.indexNames].sort() };
      });
      await tx.done;
      db.close();
      return layout;
    };
    const upgraded = freshName();
    await createVersion1Database(upgraded);
    (await openTestStore(upgraded)).close();
    const fresh = freshName();
    (await openTestStore(fresh)).close();
    expect(await describeLayout(upgraded)).toStrictEqual(await describeLayout(fresh));
  });
});
