// Opens the storage module and presents it to the screens as AppData.
import type { RecordSet } from '../../core/records/kinds';
import { openStore, type RejectedRecord, type SpanlogStore } from '../storage/store';
import { requestPersistentStorage } from '../storage/persistence';
import type { AppData } from './data';

function adapt(store: SpanlogStore, setAside: RejectedRecord[]): AppData {
  return {
    setAside: () => [...setAside],
    listLines: async () => (await store.listLines()).lines,
    loadLine: async (lineId) => {
      const bundle = await store.loadLine(lineId);
      if (bundle === undefined) return null;
      const records: RecordSet = {
        line: [bundle.line],
        section: bundle.sections,
        structure: bundle.structures,
        span: bundle.spans,
        wire: bundle.wires,
        reading: bundle.readings,
      };
      return records;
    },
    save: (kind, input) => store.save(kind, input),
    remove: async (kind, id) => {
      await store.remove(kind, id);
    },
    saveDraft: async (key, values) => {
      await store.saveDraft(key, values);
    },
    loadDraft: async (key) => (await store.loadDraft(key)) ?? null,
    clearDraft: (key) => store.clearDraft(key),
    putAll: async (records) => {
      await store.putRaw(records);
    },
    files: store,
  };
}

/** Opens the database (creating or upgrading it) and asks the browser to keep it under storage pressure. */
export async function openAppData(): Promise<AppData> {
  const setAside: RejectedRecord[] = [];
  const store = await openStore({
    onRejected: (rejected) => {
      setAside.push(...rejected);
      console.warn('Spanlog set aside records that failed validation:', rejected);
    },
  });
  void requestPersistentStorage();
  return adapt(store, setAside);
}
