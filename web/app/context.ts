// Shared handles for screens: the data layer and a flag that a form holds unsaved typing (so an update waits).
import { createContext } from 'preact';
import { useCallback, useContext, useEffect, useState } from 'preact/hooks';
import type { RecordSet } from '../../core/records/kinds';
import type { AppData } from './data';

export const DataContext = createContext<AppData | null>(null);

export function useData(): AppData {
  const data = useContext(DataContext);
  if (data === null) throw new Error('DataContext is missing: render screens inside <App>.');
  return data;
}

export type Loaded<T> =
  { state: 'loading' } | { state: 'ready'; value: T } | { state: 'failed'; message: string };

/** Loads one line's records and reloads on demand (after a save). */
export function useLineRecords(lineId: string): [Loaded<RecordSet | null>, () => void] {
  const data = useData();
  const [loaded, setLoaded] = useState<Loaded<RecordSet | null>>({ state: 'loading' });
  const [generation, setGeneration] = useState(0);
  useEffect(() => {
    let current = true;
    data
      .loadLine(lineId)
      .then((value) => current && setLoaded({ state: 'ready', value }))
      .catch((error: unknown) => current && setLoaded({ state: 'failed', message: String(error) }));
    return () => {
      current = false;
    };
  }, [data, lineId, generation]);
  const reload = useCallback(() => setGeneration((value) => value + 1), []);
  return [loaded, reload];
}
