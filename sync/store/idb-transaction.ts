import { StorageFullError, isQuotaError } from './types';

/** What settleIdbTransaction needs of an `idb` transaction. */
export type IdbTxLike = { done: Promise<void>; abort(): void; error: DOMException | null };

/**
 * Runs `work` inside an already opened IndexedDB transaction and waits for the commit: the work's result once the
 * transaction completed; on any failure the transaction is aborted (nothing of it is kept) and a full device is
 * reported as StorageFullError. Shared by the record store and the photo store.
 */
export async function settleIdbTransaction<T>(tx: IdbTxLike, work: () => Promise<T>): Promise<T> {
  // The transaction's completion promise rejects on abort; observe it so that it never goes unhandled.
  const done = tx.done.catch((err: unknown) => err);
  try {
    const result = await work();
    const outcome = await done;
    if (outcome instanceof Error || (outcome && typeof outcome === 'object' && 'name' in outcome)) throw outcome;
    return result;
  } catch (err) {
    try {
      tx.abort();
    } catch {
      // already finished or aborted
    }
    await done;
    if (isQuotaError(err) || isQuotaError(tx.error)) throw new StorageFullError(err);
    throw err;
  }
}
