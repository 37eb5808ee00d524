import { useRouter } from 'expo-router';
import { ActivityIndicator } from 'react-native';
import { colors } from '@/constants/theme';
import { Button, EmptyState, ErrorText, Screen } from '@/components/ui';
import { errorMessage } from '@/hooks/api/client';
import { useEvents } from '@/hooks/api/use-events';
import { useSites } from '@/hooks/api/use-sites';
import { useBreakpoint } from '@/hooks/use-breakpoint';
import { useCurrentClub } from '@/hooks/use-current-club';
import { can } from '@/shared/schemas';
import { EventList } from './event-list';

/** Home: the current club's field days. */
export function EventsScreen() {
  const { club, role } = useCurrentClub();
  const router = useRouter();
  const { isWide } = useBreakpoint();
  const events = useEvents(club?.id);
  const sites = useSites(club?.id);
  const canWrite = !!role && can(role, 'event.write');
  if (!club) return null;
  const create = canWrite ? <Button label="New event" icon="plus" testID="events-new" onPress={() => router.navigate('/events/new')} /> : null;
  return (
    <Screen title="Events" subtitle={`${club.name}: field days and outings`} actions={create} testID="events">
      <ErrorText boxed message={events.error ? errorMessage(events.error) : null} testID="events-error" />
      {events.isLoading ? <ActivityIndicator color={colors.action} size="large" /> : null}
      {events.data && events.data.length === 0 ? (
        <EmptyState
          icon="calendar"
          title="No events yet"
          body={canWrite ? 'Create the first field day: pick its days and the site where the antennas go.' : "The club's lead or admin creates events. They appear here."}
          action={create}
          testID="events-empty"
        />
      ) : null}
      {events.data && events.data.length > 0 ? <EventList events={events.data} sites={sites.data ?? []} mode={isWide ? 'table' : 'cards'} /> : null}
    </Screen>
  );
}
