import { useEffect } from 'react';
import { useRouter } from 'expo-router';
import { ActivityIndicator, Platform, StyleSheet, View } from 'react-native';
import { Button, ErrorText, ListRow, Screen, Txt } from '@/components/ui';
import { SpotStateBadge } from '@/components/plan/spot-state-badge';
import { colors, spacing } from '@/constants/theme';
import { useEventRecords } from '@/hooks/plan/use-event-records';
import { useSpotReviews } from '@/hooks/plan/use-spot-reviews';
import { useSession } from '@/hooks/auth/use-session';
import { useCurrentClub } from '@/hooks/use-current-club';
import { can } from '@/shared/schemas';
import { CrewSheet } from './crew-sheet';
import { addPrintStyle, printSheets, webData } from './print-style';

const READY = new Set(['cleared', 'up', 'down']);

/**
 * The crews' sheets: one per spot cleared to raise (or already up or down); one spot, or all of them to print. The
 * list puts the sheets of the stations that name the signed-in person as crew first (from the local records, so
 * offline too), then the rest: anyone may help anywhere, but a crew should find its own antennas at once.
 */
export function SheetsScreen({ eventId, spotId }: { eventId: string; spotId?: string }) {
  const { role } = useCurrentClub();
  const router = useRouter();
  const userId = useSession().user?.id ?? null;
  const records = useEventRecords(eventId);
  const reviews = useSpotReviews(records);
  useEffect(addPrintStyle, []);
  if (records === undefined) return <ActivityIndicator color={colors.action} size="large" style={styles.loading} testID="sheets-loading" />;
  if (records === null || !reviews) return <Screen title="Sheets"><ErrorText boxed message="This event is not on this device yet. Connect once so it can sync." testID="sheets-missing" /></Screen>;
  const canMark = !!role && can(role, 'spot.status');
  const ready = reviews.spots.filter((s) => READY.has(s.review.state));
  const stationName = (id: string) => records.stations.find((s) => s.id === id)?.name ?? 'Station';
  const one = spotId ? ready.find((s) => s.spot.id === spotId) : undefined;
  const myStations = userId ? records.stations.filter((s) => s.crewMemberIds.includes(userId)) : [];
  const mine = ready.filter((s) => myStations.some((st) => st.id === s.spot.stationId));
  const others = ready.filter((s) => !mine.includes(s));
  const row = (s: (typeof ready)[number]) => (
    <ListRow key={s.spot.id} title={`${stationName(s.spot.stationId)} · ${s.spot.band}`} subtitle={s.supportLabels.join(' – ')} icon="clipboard" testID={`sheets-open-${s.spot.stationId}-${s.spot.band}`} onPress={() => router.navigate(`/events/${eventId}/sheets/${s.spot.id}`)} right={<SpotStateBadge state={s.review.state} />} />
  );
  const printButton = Platform.OS === 'web' ? <Button label="Print" variant="secondary" testID="sheets-print" onPress={printSheets} /> : null;

  if (spotId) {
    return (
      <Screen title="Crew sheet" subtitle={records.event.name} testID="sheet-screen" actions={<View style={styles.actions} {...webData({ print: 'hide' })}><Button label="All sheets" variant="quiet" testID="sheet-back" onPress={() => router.navigate(`/events/${eventId}/sheets`)} />{printButton}</View>}>
        {one ? <CrewSheet records={records} evaluation={one} canMark={canMark} /> : <ErrorText boxed message="This antenna has no sheet: it is not cleared to raise (it may have gone back to review)." testID="sheet-not-ready" />}
      </Screen>
    );
  }
  return (
    <Screen title="Sheets" subtitle={`${records.event.name} · ${ready.length} ready`} testID="sheets-screen" actions={ready.length > 0 ? <View {...webData({ print: 'hide' })}>{printButton}</View> : null}>
      {ready.length === 0 ? <Txt testID="sheets-empty">No antenna is cleared to raise yet. Sheets appear here when the safety officer clears a spot.</Txt> : null}
      <View {...webData({ print: 'hide' })} style={styles.list}>
        {myStations.length > 0 ? (
          <View testID="sheets-mine" style={styles.group}>
            <Txt variant="title" accessibilityRole="header">Antennas you raise</Txt>
            <Txt variant="caption" color={colors.inkMuted}>
              You are named as crew of {myStations.map((s) => s.name).join(' and ')}.
              {mine.length === 0 ? ` None of ${myStations.length === 1 ? 'its' : 'their'} antennas is cleared to raise yet.` : ''}
            </Txt>
            {mine.map(row)}
          </View>
        ) : null}
        {others.length > 0 ? (
          <View testID="sheets-others" style={styles.group}>
            {myStations.length > 0 ? <Txt variant="title" accessibilityRole="header">Other stations’ antennas</Txt> : null}
            {others.map(row)}
          </View>
        ) : null}
      </View>
      {Platform.OS === 'web' ? (
        <View style={styles.printOnly} {...webData({ print: 'all' })}>
          {ready.map((s) => <CrewSheet key={s.spot.id} records={records} evaluation={s} canMark={false} />)}
        </View>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  loading: { marginTop: spacing.xxxl },
  actions: { flexDirection: 'row', gap: spacing.s },
  list: { marginBottom: spacing.xl, gap: spacing.l },
  group: { gap: spacing.xs },
  printOnly: { display: 'none' },
});
