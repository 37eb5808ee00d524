// The public entry of the sync layer (no React): what hooks/sync and the app use.
export { createSyncClient, RecordWriteError, type SyncClient, type SyncClientOptions, type SyncStatus, type RecordFilter, type ChangeListener } from './engine/sync-client';
export { SyncError, type SyncErrorCode } from './engine/sync-engine';
export { requestPersistentStorage } from './engine/storage-persistence';
export { browserTriggerEnv } from './engine/triggers';
export { randomId } from './engine/random-id';
export { createFetchTransport, type FetchTransportOptions } from './transport/fetch-transport';
export { openIdbStore, idbDatabaseName } from './store/idb-store';
export { createMemoryStore, MemoryDatabase } from './store/memory-store';
export { StorageFullError, type LocalStore, type LocalRejection, type RecordSyncState } from './store/types';
export { PROTOCOL_VERSION, SCHEMA_VERSION } from './protocol';
// The sync-problems screen: entries of GET …/sync/conflicts and …/sync/rejected, and the clock's wall time.
export { conflictEntrySchema, rejectedEntrySchema, decodeHlc, type ConflictEntry, type RejectedEntry, type ResolveConflictBody } from './protocol';
