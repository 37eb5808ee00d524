import { Badge } from '@/components/ui';
import { SYNC_STATE_LOOK } from '@/constants/states';
import { useRecordSyncState } from '@/hooks/sync';
import type { CollectionName } from '@/shared/schemas';

/** Whether this record is only on the phone, on the server, or was refused: shown on every record. */
export function SyncBadge({ collection, id, testID }: { collection: CollectionName; id: string; testID?: string }) {
  const state = useRecordSyncState(collection, id);
  return <Badge look={SYNC_STATE_LOOK[state]} testID={testID ?? `sync-${id}`} />;
}
