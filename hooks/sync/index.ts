export { SyncProvider, useSyncContext } from './sync-provider';
export { useRecords, useRecord } from './use-records';
export { useMutate, type Mutate } from './use-mutate';
export { useSyncStatus, useRecordSyncState, type SyncStatusView } from './use-sync-status';
