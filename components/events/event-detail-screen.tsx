import { useRouter } from 'expo-router';
import { useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import type { IconName } from '@/constants/icons';
import { colors, spacing } from '@/constants/theme';
import { Badge, Button, Card, ErrorText, ListRow, Screen, Tabular, Txt } from '@/components/ui';
import { localTodayIso } from '@/components/shell/focus-event';
import { TwoPane } from '@/components/shell/two-pane';
import { errorMessage } from '@/hooks/api/client';
import { useDeleteEvent, useEvent, useEvents } from '@/hooks/api/use-events';
import { useSite, useSites } from '@/hooks/api/use-sites';
import { useCurrentClub } from '@/hooks/use-current-club';
import { can, type ClubEvent, type Role } from '@/shared/schemas';
import { formatLatLon } from '@/components/sites/lat-lon';
import { daysUntil, formatDayRange } from './day-range';
import { EventList } from './event-list';

/** One event: its days, its site, and the way into the survey, the plan, the review and the sheets. */
export function EventDetailScreen({ eventId }: { eventId: string }) {
  const { club } = useCurrentClub();
  const events = useEvents(club?.id);
  const sites = useSites(club?.id);
  return (
    <TwoPane
      testID="event-two-pane"
      list={<EventList events={events.data ?? []} sites={sites.data ?? []} mode="compact" selectedId={eventId} />}
      detail={<EventDetail eventId={eventId} />}
    />
  );
}

function EventDetail({ eventId }: { eventId: string }) {
  const { club, role } = useCurrentClub();
  const router = useRouter();
  const event = useEvent(club?.id, eventId);
  const site = useSite(club?.id, event.data?.siteId);
  const remove = useDeleteEvent(club?.id ?? '');
  const [confirm, setConfirm] = useState(false);
  if (!club || !role) return null;
  if (event.isLoading) return <ActivityIndicator color={colors.action} size="large" style={styles.loading} />;
  if (event.error || !event.data) {
    return (
      <Screen title="Event" narrow>
        <ErrorText boxed message={errorMessage(event.error)} testID="event-error" />
      </Screen>
    );
  }
  const e = event.data;
  const canWrite = can(role, 'event.write');
  const n = daysUntil(e.startsOn, localTodayIso());
  return (
    <Screen
      title={e.name}
      subtitle={formatDayRange(e.startsOn, e.endsOn)}
      testID="event-detail"
      actions={canWrite ? <Button label="Edit" icon="pencil" variant="secondary" testID="event-edit" onPress={() => router.navigate(`/events/${e.id}/edit`)} /> : null}
    >
      {n > 0 ? <Badge look={{ label: `Starts in ${n} day${n === 1 ? '' : 's'}`, icon: 'calendar', fg: colors.action, bg: colors.infoSoft, border: colors.action }} testID="event-countdown" /> : null}
      <View style={styles.gap} />
      <Card title="Work for this event" testID="event-work">
        {workLinks(e, role).map((l) => (
          <ListRow key={l.key} testID={`event-go-${l.key}`} title={l.title} subtitle={l.subtitle} icon={l.icon} onPress={() => router.navigate(l.href)} />
        ))}
      </Card>
      <Card title="Site" testID="event-site-card">
        {site.data ? (
          <ListRow
            testID="event-site-link"
            title={site.data.name}
            subtitle={formatLatLon(site.data.refLat, site.data.refLon)}
            icon="map-pin"
            onPress={() => router.navigate(`/sites/${site.data.id}`)}
          />
        ) : (
          <ErrorText message={site.error ? errorMessage(site.error) : null} testID="event-site-error" />
        )}
      </Card>
      {e.notes ? (
        <Card title="Notes">
          <Txt>{e.notes}</Txt>
        </Card>
      ) : null}
      <Txt variant="caption" color={colors.inkMuted}>
        Days <Tabular size={14}>{e.startsOn}</Tabular> to <Tabular size={14}>{e.endsOn}</Tabular>
      </Txt>
      {canWrite ? (
        <View style={styles.danger}>
          <ErrorText boxed message={remove.error ? errorMessage(remove.error) : null} testID="event-delete-error" />
          {confirm ? (
            <View style={styles.row}>
              <Button label="Delete this event" variant="danger" icon="trash" testID="event-delete-confirm" busy={remove.isPending} onPress={() => remove.mutate(e.id, { onSuccess: () => router.replace('/events') })} />
              <Button label="Keep it" variant="quiet" testID="event-delete-cancel" onPress={() => setConfirm(false)} />
            </View>
          ) : (
            <Button label="Delete event" variant="danger" icon="trash" testID="event-delete" onPress={() => setConfirm(true)} />
          )}
        </View>
      ) : null}
    </Screen>
  );
}

type WorkLink = { key: string; title: string; subtitle: string; icon: IconName; href: string };

/** The parts of the job, each shown to the roles that do or read it. */
function workLinks(e: ClubEvent, role: Role): WorkLink[] {
  const links: (WorkLink & { show: boolean })[] = [
    { key: 'survey', title: 'Survey the site', subtitle: 'Supports, power lines, paths and photos', icon: 'tree', href: `/sites/${e.siteId}/survey`, show: role !== 'crew' },
    { key: 'plan', title: 'Plan the antennas', subtitle: 'Which supports carry which dipole, how high', icon: 'drafting', href: `/events/${e.id}/plan`, show: role === 'admin' || role === 'lead' || role === 'safety' },
    { key: 'review', title: 'Review clearances', subtitle: 'Power lines, fall zones, public areas, RF exposure', icon: 'shield', href: `/events/${e.id}/review`, show: role !== 'scout' && role !== 'crew' },
    { key: 'sheets', title: 'Crew sheets', subtitle: 'One sheet per antenna for the day', icon: 'clipboard', href: `/events/${e.id}/sheets`, show: role !== 'scout' },
  ];
  return links.filter((l) => l.show);
}

const styles = StyleSheet.create({
  loading: { marginTop: spacing.xxl },
  gap: { height: spacing.l },
  danger: { marginTop: spacing.xl, gap: spacing.s, alignItems: 'flex-start' },
  row: { flexDirection: 'row', gap: spacing.s, flexWrap: 'wrap' },
});
