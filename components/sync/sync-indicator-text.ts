import type { SyncStatusView } from '@/hooks/sync';

/** The words of the sync indicator, from the status (pure, so it is tested without rendering). */
export interface IndicatorText {
  tone: 'ok' | 'waiting' | 'offline' | 'error';
  headline: string;
  detail: string;
  warnings: string[];
}

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function clockTime(iso: string, nowMs: number): string {
  const t = new Date(iso);
  const sameDay = new Date(nowMs).toDateString() === t.toDateString();
  const hm = t.toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' });
  return sameDay ? hm : `${t.toLocaleDateString([], { month: 'short', day: 'numeric' })} ${hm}`;
}

/** `openConflicts`: the club's values recorded twice still to settle (counted only for people who may read them). */
export function indicatorText(s: SyncStatusView, nowMs: number, openConflicts = 0): IndicatorText {
  const waiting = [s.pendingChanges > 0 ? plural(s.pendingChanges, 'change', 'changes') : null, s.pendingPhotos > 0 ? plural(s.pendingPhotos, 'photo', 'photos') : null].filter(Boolean).join(' and ');
  const last = s.lastSyncedAt ? `Last synced ${clockTime(s.lastSyncedAt, nowMs)}` : 'Not synced yet on this device';
  const warnings: string[] = [];
  if (!s.durable) warnings.push('This device keeps changes only while the app is open: sync before closing it.');
  if (s.storagePersisted === false) warnings.push('This browser may clear Loftline’s saved data when storage runs low. Sync when you can, or add Loftline to the home screen.');
  if (s.rejectedCount > 0) warnings.push(`${plural(s.rejectedCount, 'change was', 'changes were')} not accepted by the server: open the record to see why.`);
  if (openConflicts > 0) warnings.push(`${plural(openConflicts, 'value was', 'values were')} recorded twice at once and need a look on site: see Changes to check.`);
  if (s.error) return { tone: 'error', headline: waiting ? `${waiting} not synced` : 'Sync problem', detail: `${s.error} ${last}.`, warnings };
  if (!s.online) return { tone: 'offline', headline: waiting ? `Offline · ${waiting} saved on this device` : 'Offline', detail: `Everything is kept on this device and syncs when the network is back. ${last}.`, warnings };
  if (waiting) return { tone: 'waiting', headline: `${waiting} waiting to sync`, detail: s.syncing ? `Syncing now… ${last}.` : `${last}.`, warnings };
  return { tone: 'ok', headline: s.syncing ? 'Syncing…' : 'All changes synced', detail: `${last}.`, warnings };
}
