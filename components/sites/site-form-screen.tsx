import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'expo-router';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { colors, spacing } from '@/constants/theme';
import { Button, Card, ErrorText, FormNumberField, FormTextField, Screen, Txt } from '@/components/ui';
import { errorMessage, fieldErrors } from '@/hooks/api/client';
import { useCreateSite, useSite, useUpdateSite } from '@/hooks/api/use-sites';
import { useCurrentClub } from '@/hooks/use-current-club';
import { useUnits } from '@/hooks/use-units';
import { can, type Site } from '@/shared/schemas';
import { siteFormSchema } from './site-form-schema';
import { useMyPosition } from './use-my-position';

export function SiteFormScreen({ siteId }: { siteId?: string }) {
  const { club, role } = useCurrentClub();
  const existing = useSite(club?.id, siteId);
  if (!club) return null;
  const title = siteId ? 'Edit site' : 'New site';
  if (!role || !can(role, 'event.write')) {
    return (
      <Screen title={title} narrow>
        <ErrorText boxed message="Only the club's lead or admin adds and edits sites." testID="site-form-forbidden" />
      </Screen>
    );
  }
  if (siteId && existing.isLoading) return <ActivityIndicator color={colors.action} size="large" />;
  if (existing.error) {
    return (
      <Screen title={title} narrow>
        <ErrorText boxed message={errorMessage(existing.error)} testID="site-form-load-error" />
      </Screen>
    );
  }
  return <SiteForm clubId={club.id} existing={existing.data} title={title} />;
}

function SiteForm({ clubId, existing, title }: { clubId: string; existing?: Site; title: string }) {
  const router = useRouter();
  const create = useCreateSite(clubId);
  const update = useUpdateSite(clubId, existing?.id ?? '');
  const save = existing ? update : create;
  const position = useMyPosition();
  const { formatLengthM } = useUnits();
  const [fixNote, setFixNote] = useState<string | null>(null);
  const { control, handleSubmit, setValue } = useForm({
    resolver: zodResolver(siteFormSchema),
    mode: 'onChange',
    defaultValues: existing
      ? { name: existing.name, refLat: existing.refLat, refLon: existing.refLon, notes: existing.notes, accessNotes: existing.accessNotes, rules: existing.rules }
      : { name: '', refLat: null as unknown as number, refLon: null as unknown as number, notes: '', accessNotes: '', rules: '' },
  });
  const server = fieldErrors(save.error);
  const useFix = async () => {
    const fix = await position.locate();
    if (!fix) return;
    setValue('refLat', Number(fix.lat.toFixed(6)), { shouldValidate: true, shouldDirty: true });
    setValue('refLon', Number(fix.lon.toFixed(6)), { shouldValidate: true, shouldDirty: true });
    setFixNote(fix.accuracyM !== null ? `Position taken, good to about ${formatLengthM(fix.accuracyM)}.` : 'Position taken.');
  };
  const submit = handleSubmit((v) =>
    save.mutate({ ...v, notes: v.notes ?? '', accessNotes: v.accessNotes ?? '', rules: v.rules ?? '' }, { onSuccess: (saved) => router.replace(`/sites/${saved.id}`) }),
  );
  return (
    <Screen title={title} subtitle="A park or field where the club puts up antennas." narrow testID="site-form">
      <Card>
        <FormTextField control={control} name="name" label="Name" testID="site-name" placeholder="Heron Lake picnic field" serverError={server.name} />
        <Txt variant="label">Reference point</Txt>
        <Txt variant="caption" color={colors.inkMuted} style={styles.help}>
          A spot everyone can find, such as the gate or the shelter: decimal degrees, WGS 84 (what phones and GPS show).
        </Txt>
        <View style={styles.pair}>
          <View style={styles.half}>
            <FormNumberField control={control} name="refLat" label="Latitude" testID="site-lat" placeholder="44.81234" serverError={server.refLat} />
          </View>
          <View style={styles.half}>
            <FormNumberField control={control} name="refLon" label="Longitude" testID="site-lon" placeholder="-93.50210" serverError={server.refLon} />
          </View>
        </View>
        <Button label="Use my position" icon="crosshair" variant="secondary" testID="site-use-position" busy={position.busy} onPress={useFix} style={styles.fix} />
        <ErrorText message={position.error} testID="site-position-error" />
        {fixNote ? (
          <Txt variant="caption" color={colors.ok} testID="site-position-note">
            {fixNote}
          </Txt>
        ) : null}
        <View style={styles.gap} />
        <FormTextField control={control} name="accessNotes" label="Getting there (optional)" testID="site-access" multiline placeholder="Gate code, where to park the trailer" serverError={server.accessNotes} />
        <FormTextField control={control} name="rules" label="Site rules (optional)" testID="site-rules" multiline placeholder={'One per line, e.g.\nNo stakes in the lawn\nOut by 20:00'} serverError={server.rules} />
        <FormTextField control={control} name="notes" label="Notes (optional)" testID="site-notes" multiline serverError={server.notes} />
        <ErrorText boxed message={save.error ? errorMessage(save.error) : null} testID="site-save-error" />
        <View style={styles.actions}>
          <Button label={existing ? 'Save changes' : 'Add site'} icon="check-circle" testID="site-save" busy={save.isPending} onPress={submit} />
          <Button label="Cancel" variant="quiet" testID="site-cancel" onPress={() => (router.canGoBack() ? router.back() : router.replace('/sites'))} />
        </View>
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({
  help: { marginBottom: spacing.s },
  pair: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.m },
  half: { flexGrow: 1, flexBasis: 180 },
  fix: { alignSelf: 'flex-start' },
  gap: { height: spacing.l },
  actions: { flexDirection: 'row', gap: spacing.s, flexWrap: 'wrap', marginTop: spacing.s },
});
