import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'expo-router';
import { useForm } from 'react-hook-form';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { colors, spacing } from '@/constants/theme';
import { Button, Card, EmptyState, ErrorText, FormSelect, FormTextField, Screen } from '@/components/ui';
import { errorMessage, fieldErrors } from '@/hooks/api/client';
import { useCreateEvent, useEvent, useUpdateEvent } from '@/hooks/api/use-events';
import { useSites } from '@/hooks/api/use-sites';
import { useCurrentClub } from '@/hooks/use-current-club';
import { can, eventFieldsSchema, type ClubEvent, type Site } from '@/shared/schemas';

/** Create an event (no id) or edit one. */
export function EventFormScreen({ eventId }: { eventId?: string }) {
  const { club, role } = useCurrentClub();
  const sites = useSites(club?.id);
  const existing = useEvent(club?.id, eventId);
  if (!club) return null;
  const title = eventId ? 'Edit event' : 'New event';
  if (!role || !can(role, 'event.write')) {
    return (
      <Screen title={title} narrow>
        <ErrorText boxed message="Only the club's lead or admin creates and edits events." testID="event-form-forbidden" />
      </Screen>
    );
  }
  if (sites.isLoading || (eventId && existing.isLoading)) return <ActivityIndicator color={colors.action} size="large" />;
  const err = sites.error ?? existing.error;
  if (err) {
    return (
      <Screen title={title} narrow>
        <ErrorText boxed message={errorMessage(err)} testID="event-form-load-error" />
      </Screen>
    );
  }
  return <EventForm clubId={club.id} sites={(sites.data ?? []).filter((s) => !s.deletedAt)} existing={existing.data} title={title} />;
}

function EventForm({ clubId, sites, existing, title }: { clubId: string; sites: Site[]; existing?: ClubEvent; title: string }) {
  const router = useRouter();
  const create = useCreateEvent(clubId);
  const update = useUpdateEvent(clubId, existing?.id ?? '');
  const save = existing ? update : create;
  const { control, handleSubmit } = useForm({
    resolver: zodResolver(eventFieldsSchema),
    mode: 'onChange',
    defaultValues: existing
      ? { siteId: existing.siteId, name: existing.name, startsOn: existing.startsOn, endsOn: existing.endsOn, notes: existing.notes }
      : { siteId: sites.length === 1 ? sites[0].id : '', name: '', startsOn: '', endsOn: '', notes: '' },
  });
  const server = fieldErrors(save.error);
  if (sites.length === 0) {
    return (
      <Screen title={title} narrow testID="event-form">
        <EmptyState
          icon="map-pin"
          title="First add the site"
          body="An event happens at a site: the park or field where the antennas go. Add it, then come back."
          action={<Button label="Add a site" icon="plus" testID="event-form-add-site" onPress={() => router.navigate('/sites/new')} />}
        />
      </Screen>
    );
  }
  const submit = handleSubmit((fields) =>
    save.mutate({ ...fields, notes: fields.notes ?? '' }, { onSuccess: (saved) => router.replace(`/events/${saved.id}`) }),
  );
  return (
    <Screen title={title} subtitle="A field day or outing at one of the club's sites." narrow testID="event-form">
      <Card>
        <FormTextField control={control} name="name" label="Name" testID="event-name" placeholder="e.g. Spring outing at the meadow" serverError={server.name} />
        <View style={styles.days}>
          <View style={styles.day}>
            <FormTextField control={control} name="startsOn" label="First day" testID="event-starts" placeholder="2026-12-12" mono hint="As YYYY-MM-DD" serverError={server.startsOn} />
          </View>
          <View style={styles.day}>
            <FormTextField control={control} name="endsOn" label="Last day" testID="event-ends" placeholder="2026-12-13" mono hint="Same day for a one-day outing" serverError={server.endsOn} />
          </View>
        </View>
        <FormSelect control={control} name="siteId" label="Site" testID="event-site" options={sites.map((s) => ({ value: s.id, label: s.name }))} serverError={server.siteId} />
        <FormTextField control={control} name="notes" label="Notes" testID="event-notes" multiline placeholder="Stations, call-in times, who brings the masts" serverError={server.notes} />
        <ErrorText boxed message={save.error ? errorMessage(save.error) : null} testID="event-save-error" />
        <View style={styles.actions}>
          <Button label={existing ? 'Save changes' : 'Create event'} icon="check-circle" testID="event-save" busy={save.isPending} onPress={submit} />
          <Button label="Cancel" variant="quiet" testID="event-cancel" onPress={() => (router.canGoBack() ? router.back() : router.replace('/events'))} />
        </View>
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({
  days: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.m },
  day: { flexGrow: 1, flexBasis: 200 },
  actions: { flexDirection: 'row', gap: spacing.s, flexWrap: 'wrap', marginTop: spacing.s },
});
