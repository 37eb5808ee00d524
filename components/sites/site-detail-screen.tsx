import { useRouter } from 'expo-router';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { colors, spacing } from '@/constants/theme';
import { Button, Card, ErrorText, ListRow, Screen, Tabular, Txt } from '@/components/ui';
import { TwoPane } from '@/components/shell/two-pane';
import { formatDayRange } from '@/components/events/day-range';
import { errorMessage } from '@/hooks/api/client';
import { useEvents } from '@/hooks/api/use-events';
import { useSite, useSites } from '@/hooks/api/use-sites';
import { useCurrentClub } from '@/hooks/use-current-club';
import { can } from '@/shared/schemas';
import { formatLatLon } from './lat-lon';
import { SiteList } from './site-list';

export function SiteDetailScreen({ siteId }: { siteId: string }) {
  const { club } = useCurrentClub();
  const sites = useSites(club?.id);
  const events = useEvents(club?.id);
  return <TwoPane testID="site-two-pane" list={<SiteList sites={sites.data ?? []} events={events.data ?? []} mode="rows" selectedId={siteId} />} detail={<SiteDetail siteId={siteId} />} />;
}

function SiteDetail({ siteId }: { siteId: string }) {
  const { club, role } = useCurrentClub();
  const router = useRouter();
  const site = useSite(club?.id, siteId);
  const events = useEvents(club?.id);
  if (!club || !role) return null;
  if (site.isLoading) return <ActivityIndicator color={colors.action} size="large" style={styles.loading} />;
  if (site.error || !site.data) {
    return (
      <Screen title="Site" narrow>
        <ErrorText boxed message={errorMessage(site.error)} testID="site-error" />
      </Screen>
    );
  }
  const s = site.data;
  const here = (events.data ?? []).filter((e) => e.siteId === s.id && !e.deletedAt).sort((a, b) => b.startsOn.localeCompare(a.startsOn));
  const canWrite = can(role, 'event.write');
  const canSurvey = can(role, 'survey.write');
  return (
    <Screen
      title={s.name}
      subtitle={formatLatLon(s.refLat, s.refLon)}
      testID="site-detail"
      actions={
        <>
          <Button label={canSurvey ? 'Survey this site' : 'See the survey'} icon="tree" testID="site-survey" onPress={() => router.navigate(`/sites/${s.id}/survey`)} />
          {canWrite ? <Button label="Edit" icon="pencil" variant="secondary" testID="site-edit" onPress={() => router.navigate(`/sites/${s.id}/edit`)} /> : null}
        </>
      }
    >
      <Card title="Reference point" testID="site-ref">
        <Tabular size={18} testID="site-ref-figures">
          {s.refLat.toFixed(6)}, {s.refLon.toFixed(6)}
        </Tabular>
        <Txt variant="caption" color={colors.inkMuted}>
          Decimal degrees, WGS 84 · {formatLatLon(s.refLat, s.refLon)}
        </Txt>
      </Card>
      <Card title="Ground" testID="site-ground">
        <Txt>{s.groundDescription || (s.groundClass ? s.groundClass : 'Not recorded yet. The scout notes the ground during the survey.')}</Txt>
      </Card>
      {s.accessNotes ? <TextCard title="Getting there" text={s.accessNotes} testID="site-access-card" /> : null}
      {s.rules ? <TextCard title="Site rules" text={s.rules} testID="site-rules-card" /> : null}
      {s.notes ? <TextCard title="Notes" text={s.notes} testID="site-notes-card" /> : null}
      <Card title={`Events here (${here.length})`} testID="site-events">
        {here.length === 0 ? <Txt color={colors.inkMuted}>No event at this site yet.</Txt> : null}
        {here.map((e) => (
          <ListRow key={e.id} testID={`site-event-${e.id}`} title={e.name} subtitle={formatDayRange(e.startsOn, e.endsOn)} icon="calendar" onPress={() => router.navigate(`/events/${e.id}`)} />
        ))}
      </Card>
    </Screen>
  );
}

function TextCard({ title, text, testID }: { title: string; text: string; testID: string }) {
  return (
    <Card title={title} testID={testID}>
      <View style={styles.lines}>
        {text.split('\n').map((line, i) => (
          <Txt key={i}>{line}</Txt>
        ))}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  loading: { marginTop: spacing.xxl },
  lines: { gap: spacing.xs },
});
