// Opens a store on fake-indexeddb with a fresh database name, a ticking clock and predictable ids.
import 'fake-indexeddb/auto';
import { openStore, type SpanlogStore, type StoreOptions } from '../../../web/storage/store';
import { testUuid } from '../../core/records/samples';

let databases = 0;

/** A database name no other test uses. */
export function freshName(): string {
  databases += 1;
  return `spanlog-test-${databases}`;
}

/** A clock that advances one second per call from 2026-05-14T09:00:00Z, and ids from testUuid(1000). */
export function testClock(): Required<Pick<StoreOptions, 'now' | 'newId'>> {
  let seconds = 0;
  let ids = 1000;
  return {
    now: () => new Date(Date.UTC(2026, 4, 14, 9, 0, seconds++)).toISOString(),
    newId: () => testUuid(ids++),
  };
}

export async function openTestStore(name = freshName(), options: StoreOptions = {}): Promise<SpanlogStore> {
  return openStore({ name, ...testClock(), ...options });
}
