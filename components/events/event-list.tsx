import { useRouter } from 'expo-router';
import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '@/constants/theme';
import { Badge, Card, DataTable, ListRow, Tabular, Txt, type Column } from '@/components/ui';
import { localTodayIso } from '@/components/shell/focus-event';
import type { ClubEvent, Site } from '@/shared/schemas';
import { daysUntil, eventTiming, formatDayRange, type EventTiming } from './day-range';

const TIMING_LOOK: Record<EventTiming, { label: string; icon: 'calendar' | 'arrow-up' | 'check-circle'; fg: string; bg: string; border: string }> = {
  upcoming: { label: 'Coming up', icon: 'calendar', fg: colors.action, bg: colors.infoSoft, border: colors.action },
  'on-now': { label: 'On now', icon: 'arrow-up', fg: colors.onAction, bg: colors.action, border: colors.action },
  past: { label: 'Over', icon: 'check-circle', fg: colors.ink, bg: colors.surfaceSunk, border: colors.line },
};

type Props = { events: ClubEvent[]; sites: Site[]; mode: 'cards' | 'table' | 'compact'; selectedId?: string };

/** Events soonest first (past ones after, latest first): cards on a phone, a table on a wide screen. */
export function EventList({ events, sites, mode, selectedId }: Props) {
  const router = useRouter();
  const today = localTodayIso();
  const siteName = useMemo(() => new Map(sites.map((s) => [s.id, s.name])), [sites]);
  const sorted = useMemo(() => {
    const live = events.filter((e) => !e.deletedAt);
    const coming = live.filter((e) => e.endsOn >= today).sort((a, b) => a.startsOn.localeCompare(b.startsOn));
    const past = live.filter((e) => e.endsOn < today).sort((a, b) => b.startsOn.localeCompare(a.startsOn));
    return [...coming, ...past];
  }, [events, today]);
  const open = (e: ClubEvent) => router.navigate(`/events/${e.id}`);
  const when = (e: ClubEvent) => {
    const n = daysUntil(e.startsOn, today);
    return n > 0 ? `in ${n} day${n === 1 ? '' : 's'}` : '';
  };

  if (mode === 'table') {
    const columns: Column<ClubEvent>[] = [
      { key: 'name', title: 'Event', flex: 2.4, render: (e) => <Txt variant="bodyStrong">{e.name}</Txt> },
      { key: 'dates', title: 'Days', flex: 2.8, render: (e) => <Tabular>{formatDayRange(e.startsOn, e.endsOn)}</Tabular> },
      { key: 'site', title: 'Site', flex: 1.8, render: (e) => siteName.get(e.siteId) ?? 'Unknown site' },
      { key: 'state', title: 'When', flex: 1.4, render: (e) => <Badge look={TIMING_LOOK[eventTiming(e.startsOn, e.endsOn, today)]} /> },
      { key: 'in', title: 'Starts', flex: 1.3, numeric: true, render: (e) => when(e) || '—' },
    ];
    return <DataTable testID="events-table" columns={columns} rows={sorted} rowKey={(e) => e.id} rowLabel={(e) => `${e.name}, ${formatDayRange(e.startsOn, e.endsOn)}`} onRowPress={open} />;
  }
  if (mode === 'compact') {
    return (
      <View style={styles.compact} testID="events-compact">
        {sorted.map((e) => (
          <ListRow key={e.id} testID={`event-row-${e.id}`} title={e.name} subtitle={formatDayRange(e.startsOn, e.endsOn)} icon="calendar" selected={e.id === selectedId} onPress={() => open(e)} />
        ))}
      </View>
    );
  }
  return (
    <View testID="events-cards">
      {sorted.map((e) => {
        const timing = eventTiming(e.startsOn, e.endsOn, today);
        return (
          <Card key={e.id} testID={`event-card-${e.id}`} style={styles.card}>
            <ListRow testID={`event-open-${e.id}`} title={e.name} subtitle={`${siteName.get(e.siteId) ?? 'Unknown site'}`} icon="calendar" accessibilityLabel={`Open ${e.name}`} onPress={() => open(e)} />
            <View style={styles.cardFoot}>
              <Tabular>{formatDayRange(e.startsOn, e.endsOn)}</Tabular>
              <View style={styles.badges}>
                <Badge look={TIMING_LOOK[timing]} />
                {when(e) ? <Txt variant="caption" color={colors.inkMuted}>{when(e)}</Txt> : null}
              </View>
            </View>
          </Card>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  card: { padding: 0, overflow: 'hidden' },
  cardFoot: { padding: spacing.m, gap: spacing.s, backgroundColor: colors.surface },
  badges: { flexDirection: 'row', alignItems: 'center', gap: spacing.s },
  compact: { borderRadius: 12, overflow: 'hidden', borderWidth: 1.5, borderColor: colors.lineSoft },
});
