/** The part of navigator.storage used here (so that tests can pass their own). */
export interface PersistableStorage {
  persisted?: () => Promise<boolean>;
  persist?: () => Promise<boolean>;
}

/**
 * Asks the browser to keep this origin's data under storage pressure (navigator.storage.persist()).
 * Resolves true when storage is (now) persistent, false when refused or when the API is missing.
 */
export async function requestPersistentStorage(
  storage: PersistableStorage | undefined = globalThis.navigator?.storage,
): Promise<boolean> {
  if (storage?.persist === undefined) return false;
  try {
    if ((await storage.persisted?.()) === true) return true;
    return await storage.persist();
  } catch {
    return false;
  }
}
