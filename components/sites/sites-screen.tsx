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
import { SiteList } from './site-list';

/** Survey: the club's sites; each opens its detail and the scout's survey. */
export function SitesScreen() {
  const { club, role } = useCurrentClub();
  const router = useRouter();
  const { isWide } = useBreakpoint();
  const sites = useSites(club?.id);
  const events = useEvents(club?.id);
  if (!club) return null;
  const canWrite = !!role && can(role, 'event.write');
  const create = canWrite ? <Button label="New site" icon="plus" testID="sites-new" onPress={() => router.navigate('/sites/new')} /> : null;
  const live = (sites.data ?? []).filter((s) => !s.deletedAt);
  return (
    <Screen title="Sites" subtitle="Parks and fields the club surveys and plans" actions={create} testID="sites">
      <ErrorText boxed message={sites.error ? errorMessage(sites.error) : null} testID="sites-error" />
      {sites.isLoading ? <ActivityIndicator color={colors.action} size="large" /> : null}
      {sites.data && live.length === 0 ? (
        <EmptyState
          icon="map-pin"
          title="No sites yet"
          body={canWrite ? 'Add the park or field where the club puts up its antennas.' : "The club's lead or admin adds sites. They appear here."}
          action={create}
          testID="sites-empty"
        />
      ) : null}
      {live.length > 0 ? <SiteList sites={live} events={events.data ?? []} mode={isWide ? 'table' : 'rows'} /> : null}
    </Screen>
  );
}
