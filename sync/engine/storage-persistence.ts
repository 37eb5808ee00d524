/*
 * Browsers may evict a site's IndexedDB under storage pressure unless the site holds persistent storage
 * (Storage API, navigator.storage.persist()). Loftline asks for it and tells the person when it was refused.
 */

interface StorageManagerLike {
  persist?: () => Promise<boolean>;
  persisted?: () => Promise<boolean>;
}

/** true: persistent; false: the browser may evict the data; null: this platform does not say. */
export async function requestPersistentStorage(storage: StorageManagerLike | undefined = (globalThis as { navigator?: { storage?: StorageManagerLike } }).navigator?.storage): Promise<boolean | null> {
  if (!storage?.persist) return null;
  try {
    if (storage.persisted && (await storage.persisted())) return true;
    return await storage.persist();
  } catch {
    return null;
  }
}
