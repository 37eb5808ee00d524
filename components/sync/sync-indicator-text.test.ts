import { describe, expect, it } from 'vitest';
import type { SyncStatusView } from '@/hooks/sync';
import { indicatorText } from './sync-indicator-text';

const base: SyncStatusView = {
  pendingChanges: 0,
  pendingPhotos: 0,
  lastSyncedAt: null,
  online: true,
  syncing: false,
  error: null,
  errorCode: null,
  storagePersisted: true,
  durable: true,
  rejectedCount: 0,
};
const NOW = Date.parse('2026-12-01T15:00:00Z');

describe('sync indicator words (common practice: say what is kept where, never hide unsynced work)', () => {
  it('counts unsynced changes and photos separately', () => {
    const t = indicatorText({ ...base, pendingChanges: 3, pendingPhotos: 1 }, NOW);
    expect(t.tone).toBe('waiting');
    expect(t.headline).toBe('3 changes and 1 photo waiting to sync');
  });
  it('says offline work is kept on the device', () => {
    const t = indicatorText({ ...base, online: false, pendingChanges: 1 }, NOW);
    expect(t.tone).toBe('offline');
    expect(t.headline).toBe('Offline · 1 change saved on this device');
    expect(t.detail).toMatch(/kept on this device/);
  });
  it('shows an error in plain words with what is still waiting', () => {
    const t = indicatorText({ ...base, pendingChanges: 2, error: 'Sign in again to sync. Your changes stay on this device.' }, NOW);
    expect(t.tone).toBe('error');
    expect(t.headline).toBe('2 changes not synced');
    expect(t.detail).toMatch(/Sign in again/);
  });
  it('warns where the browser may evict the data, and about refused changes', () => {
    const t = indicatorText({ ...base, storagePersisted: false, rejectedCount: 1, lastSyncedAt: '2026-12-01T14:00:00Z' }, NOW);
    expect(t.tone).toBe('ok');
    expect(t.warnings.join(' ')).toMatch(/may clear/);
    expect(t.warnings.join(' ')).toMatch(/1 change was not accepted/);
    expect(t.detail).toMatch(/^Last synced /);
  });
  it('says so before the first sync', () => {
    expect(indicatorText(base, NOW).detail).toBe('Not synced yet on this device.');
  });

  it('tells people who may settle them how many values were recorded twice, and stays quiet when there are none', () => {
    expect(indicatorText(base, NOW, 2).warnings).toEqual(['2 values were recorded twice at once and need a look on site: see Changes to check.']);
    expect(indicatorText(base, NOW, 1).warnings[0]).toMatch(/^1 value was recorded twice/);
    expect(indicatorText(base, NOW).warnings).toEqual([]);
  });
});
