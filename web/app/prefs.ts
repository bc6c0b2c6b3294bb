// Small device-local preferences that are not inspection records: kept in localStorage, never synced.

const FIRST_RUN_KEY = 'spanlog.cautions-accepted';
const INSPECTOR_KEY = 'spanlog.inspector';

function read(key: string): string | null {
  try {
    return window.localStorage.getItem(key);
  } catch {
    return null;
  }
}

function write(key: string, value: string): void {
  try {
    window.localStorage.setItem(key, value);
  } catch {
    // Private windows may refuse storage; the app still works, it just asks again next time.
  }
}

export function cautionsAccepted(): boolean {
  return read(FIRST_RUN_KEY) !== null;
}

export function acceptCautions(whenIso: string): void {
  write(FIRST_RUN_KEY, whenIso);
}

/** The last inspector name used on this device, to prefill the next reading. */
export function rememberedInspector(): string {
  return read(INSPECTOR_KEY) ?? '';
}

export function rememberInspector(name: string): void {
  write(INSPECTOR_KEY, name.trim());
}
