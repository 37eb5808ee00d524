import { useRouter } from 'expo-router';
import { useEffect, useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { Icon, Txt } from '@/components/ui';
import type { IconName } from '@/constants/icons';
import { colors, radii, spacing } from '@/constants/theme';
import { CONFLICT_READERS, useOpenConflicts } from '@/hooks/api/use-sync-problems';
import { useSyncContext, useSyncStatus } from '@/hooks/sync';
import { useCurrentClub } from '@/hooks/use-current-club';
import { indicatorText, type IndicatorText } from './sync-indicator-text';

/*
 * Always visible in the shell: how many changes and photos are waiting, when the last sync finished, whether
 * the device is offline, sync errors in plain words, and a warning where the browser may evict the data.
 * Tapping it syncs now and opens the details.
 */

const LOOK: Record<IndicatorText['tone'], { icon: IconName; fg: string; bg: string }> = {
  ok: { icon: 'cloud-check', fg: colors.ok, bg: colors.okSoft },
  waiting: { icon: 'cloud-up', fg: colors.warning, bg: colors.warningSoft },
  offline: { icon: 'cloud-up', fg: colors.ink, bg: colors.surfaceSunk },
  error: { icon: 'octagon-x', fg: colors.danger, bg: colors.dangerSoft },
};

export function SyncIndicator() {
  const status = useSyncStatus();
  const { client } = useSyncContext();
  const [open, setOpen] = useState(false);
  const router = useRouter();
  const [nowMs, setNowMs] = useState(() => Date.now());
  useEffect(() => {
    const t = setInterval(() => setNowMs(Date.now()), 30_000);
    return () => clearInterval(t);
  }, []);
  const { club, role } = useCurrentClub();
  // Leads, admins and safety officers also hear of values recorded twice at once (they live on the server).
  const conflicts = useOpenConflicts(club?.id, status.online && role !== null && CONFLICT_READERS.includes(role));
  const openConflicts = conflicts.data?.length ?? 0;
  const text = indicatorText(status, nowMs, openConflicts);
  const look = LOOK[text.tone];
  const summary = `${text.headline}. ${text.detail}${text.warnings.length ? ` ${text.warnings.join(' ')}` : ''}`;
  return (
    <View style={styles.wrap}>
      <Pressable
        accessibilityRole="button"
        accessibilityLabel={`Sync status: ${summary} Tap to sync now and show details.`}
        testID="sync-indicator"
        onPress={() => {
          setOpen((o) => !o);
          void client?.syncNow();
        }}
        style={[styles.pill, { backgroundColor: look.bg, borderColor: look.fg }]}
      >
        <Icon name={look.icon} size={18} color={look.fg} />
        <Txt variant="caption" color={look.fg} style={styles.headline} testID="sync-indicator-headline">
          {text.headline}
        </Txt>
        {/* A warning (e.g. storage the browser may evict) sits beside the state, so "synced" never wears a warning sign. */}
        {text.warnings.length ? <Icon name="triangle-alert" size={16} color={colors.warning} /> : null}
      </Pressable>
      {open ? (
        <View style={styles.details} testID="sync-indicator-details" accessibilityLiveRegion="polite">
          <Txt variant="caption">{text.detail}</Txt>
          {text.warnings.map((w) => (
            <Txt key={w} variant="caption" color={colors.warning}>
              {w}
            </Txt>
          ))}
          {/* Refused changes and values recorded twice are read and settled on their own screen. */}
          <Txt
            variant="caption"
            color={colors.action}
            accessibilityRole="link"
            accessibilityLabel="Open changes to check: refused changes and values recorded twice"
            testID="sync-indicator-problems-link"
            style={styles.link}
            onPress={() => {
              setOpen(false);
              router.navigate('/sync-problems');
            }}
          >
            {status.rejectedCount > 0 ? 'See the refused changes' : openConflicts > 0 ? 'See the values recorded twice' : 'Changes to check'} ›
          </Txt>
        </View>
      ) : null}
    </View>
  );
}

export default SyncIndicator;

const styles = StyleSheet.create({
  wrap: { alignItems: 'flex-end', maxWidth: 420 },
  pill: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.xs,
    minHeight: 40,
    paddingHorizontal: spacing.m,
    borderRadius: radii.pill,
    borderWidth: 1.5,
  },
  headline: { fontSize: 14, fontWeight: '600' },
  link: { textDecorationLine: 'underline', paddingVertical: spacing.xs },
  details: {
    marginTop: spacing.xs,
    padding: spacing.m,
    gap: spacing.xs,
    backgroundColor: colors.surface,
    borderColor: colors.line,
    borderWidth: 1,
    borderRadius: radii.m,
  },
});
