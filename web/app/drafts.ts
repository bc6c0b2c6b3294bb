// Autosaved forms: every change is written to the storage module's draft store at most 250 ms later, and at once
// when the page is hidden or the form closes, so a reload or a killed tab loses nothing typed.
import { useCallback, useEffect, useRef, useState } from 'preact/hooks';
import type { UnitSystem } from '../../core/units';
import { useData } from './context';

/** Debounce of draft writes, ms (the brief asks for ≤ 300 ms). */
export const DRAFT_SAVE_DELAY_MS = 250;

const pendingFlushes = new Set<() => Promise<void>>();

/** Writes every pending draft now (before an update reloads the page). */
export async function flushAllDrafts(): Promise<void> {
  await Promise.all([...pendingFlushes].map((flush) => flush()));
}

export type DraftValues = Record<string, string>;

/**
 * Draft key of a form. Drafts hold text as typed in the line's units, so the unit system is part of the key: a
 * draft typed in feet is never read back as metres after the line switches units (it returns when it switches back).
 */
export function draftKey(form: string, id: string, units: UnitSystem): string {
  return `${form}:${id}:${units}`;
}

export interface DraftHandle {
  /** Values as typed; null while the saved draft is being read. */
  values: DraftValues | null;
  /** True when the values came back from an earlier session. */
  restored: boolean;
  set: (name: string, text: string) => void;
  setMany: (changes: DraftValues) => void;
  /** Drops the draft (after the record it describes was saved). */
  discard: () => Promise<void>;
}

/**
 * A form's raw values, restored from the draft store on open and saved back on each change.
 * @param key draft key, e.g. `reading:${wireId}`
 * @param initial values for a fresh form (used when no draft exists)
 */
export function useDraft(key: string, initial: () => DraftValues): DraftHandle {
  const data = useData();
  const [values, setValues] = useState<DraftValues | null>(null);
  const [restored, setRestored] = useState(false);
  const latest = useRef<DraftValues | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const dirty = useRef(false);
  const initialRef = useRef(initial);

  useEffect(() => {
    let current = true;
    setValues(null);
    data
      .loadDraft(key)
      .then((draft) => {
        if (!current) return;
        const start = draft ? { ...initialRef.current(), ...draft.values } : initialRef.current();
        latest.current = start;
        setRestored(draft !== null);
        setValues(start);
      })
      .catch(() => {
        if (!current) return;
        latest.current = initialRef.current();
        setValues(latest.current);
      });
    return () => {
      current = false;
    };
  }, [data, key]);

  const flush = useCallback(async (): Promise<void> => {
    if (timer.current !== undefined) clearTimeout(timer.current);
    timer.current = undefined;
    if (!dirty.current || latest.current === null) return;
    dirty.current = false;
    await data.saveDraft(key, latest.current);
  }, [data, key]);

  useEffect(() => {
    pendingFlushes.add(flush);
    const onHide = (): void => {
      if (document.visibilityState === 'hidden') void flush();
    };
    const onPageHide = (): void => void flush();
    document.addEventListener('visibilitychange', onHide);
    window.addEventListener('pagehide', onPageHide);
    return () => {
      pendingFlushes.delete(flush);
      document.removeEventListener('visibilitychange', onHide);
      window.removeEventListener('pagehide', onPageHide);
      void flush();
    };
  }, [flush]);

  const setMany = useCallback(
    (changes: DraftValues) => {
      const next = { ...(latest.current ?? {}), ...changes };
      latest.current = next;
      dirty.current = true;
      setValues(next);
      if (timer.current !== undefined) clearTimeout(timer.current);
      timer.current = setTimeout(() => void flush(), DRAFT_SAVE_DELAY_MS);
    },
    [flush],
  );

  const set = useCallback((name: string, text: string) => setMany({ [name]: text }), [setMany]);

  const discard = useCallback(async () => {
    if (timer.current !== undefined) clearTimeout(timer.current);
    timer.current = undefined;
    dirty.current = false;
    await data.clearDraft(key);
  }, [data, key]);

  return { values, restored, set, setMany, discard };
}
