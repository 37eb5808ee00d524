import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Card, ErrorText, NumberField, Select, TextField, Txt } from '@/components/ui';
import { colors, radii, spacing } from '@/constants/theme';
import { useMemberRoster } from '@/hooks/plan/use-member-roster';
import { useMutate } from '@/hooks/sync';
import { useCurrentClub } from '@/hooks/use-current-club';
import { BAND_NAMES, MODES, PURPOSES, stationFieldsSchema, type Station } from '@/shared/schemas';
import { Pressable } from 'react-native';
import { CrewPicker } from './crew-picker';
import { fieldErrors } from './issue-text';

const MODE_LABELS = { ssb: 'SSB (voice)', cw: 'CW', digital: 'Digital', fm: 'FM' } as const;
const PURPOSE_LABELS = { 'long-distance': 'Long distance', regional: 'Regional', 'near-vertical': 'Near-vertical (NVIS)' } as const;

/** Add or change one of the event's stations: bands, mode, power, what it is for and who raises its antennas. */
export function StationForm({ eventId, station, onDone }: { eventId: string; station?: Station; onDone: () => void }) {
  const mutate = useMutate();
  const roster = useMemberRoster(useCurrentClub().club?.id);
  const [crewMemberIds, setCrewMemberIds] = useState<string[]>(station?.crewMemberIds ?? []);
  const [name, setName] = useState(station?.name ?? '');
  const [bands, setBands] = useState<string[]>(station?.bands ?? []);
  const [mode, setMode] = useState<(typeof MODES)[number]>(station?.mode ?? 'ssb');
  const [powerW, setPowerW] = useState<number | null>(station?.powerW ?? 100);
  const [purpose, setPurpose] = useState<(typeof PURPOSES)[number]>(station?.purpose ?? 'regional');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [busy, setBusy] = useState(false);
  const toggle = (b: string) => setBands((cur) => (cur.includes(b) ? cur.filter((x) => x !== b) : BAND_NAMES.filter((x) => x === b || cur.includes(x))));

  const save = async () => {
    const parsed = stationFieldsSchema.safeParse({ eventId, name, bands, mode, powerW: powerW ?? undefined, purpose, crewMemberIds, notes: station?.notes ?? '' });
    if (!parsed.success) return setErrors(fieldErrors(parsed.error));
    setErrors({});
    setBusy(true);
    try {
      if (station) {
        // An unchanged crew is not sent again: the server judges the crew a change names, and a member who has
        // left since must not stop a rename.
        const sameCrew = JSON.stringify(parsed.data.crewMemberIds) === JSON.stringify(station.crewMemberIds);
        const { crewMemberIds: crew, ...rest } = parsed.data;
        await mutate.update('stations', station.id, sameCrew ? rest : { ...rest, crewMemberIds: crew });
      }
      else await mutate.create('stations', parsed.data);
      onDone();
    } catch (err) {
      setErrors({ form: err instanceof Error ? err.message : String(err) });
    } finally {
      setBusy(false);
    }
  };

  return (
    <Card title={station ? `Change ${station.name}` : 'New station'} testID="station-form">
      <TextField label="Station name" testID="station-name" value={name} onChangeText={setName} error={errors.name} />
      <Txt variant="label">Bands</Txt>
      <View style={styles.bands} accessibilityLabel="Bands" testID="station-bands">
        {BAND_NAMES.map((b) => {
          const on = bands.includes(b);
          return (
            <Pressable key={b} onPress={() => toggle(b)} accessibilityRole="checkbox" accessibilityState={{ checked: on }} aria-checked={on} accessibilityLabel={`${b} band`} testID={`station-band-${b}`} style={[styles.band, on && styles.bandOn]}>
              <Txt variant="label" color={on ? colors.onAction : colors.action}>{b}</Txt>
            </Pressable>
          );
        })}
      </View>
      {errors.bands ? <ErrorText message={errors.bands} testID="station-bands-error" /> : null}
      <Select label="Mode" testID="station-mode" options={MODES.map((m) => ({ value: m, label: MODE_LABELS[m] }))} value={mode} onChange={setMode} />
      <NumberField label="Power" suffix="W" testID="station-power" value={powerW} onChange={setPowerW} error={errors.powerW} />
      <Select label="What it is for" testID="station-purpose" options={PURPOSES.map((p) => ({ value: p, label: PURPOSE_LABELS[p] }))} value={purpose} onChange={setPurpose} />
      <CrewPicker roster={roster} value={crewMemberIds} onChange={setCrewMemberIds} />
      {errors.crewMemberIds ? <ErrorText message={errors.crewMemberIds} testID="station-crew-error" /> : null}
      {errors.form ? <ErrorText boxed message={errors.form} testID="station-form-error" /> : null}
      <View style={styles.actions}>
        <Button label={station ? 'Save station' : 'Add station'} testID="station-save" onPress={save} busy={busy} />
        <Button label="Cancel" variant="quiet" testID="station-cancel" onPress={onDone} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  bands: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.s, marginVertical: spacing.s },
  band: { minWidth: 56, minHeight: 48, alignItems: 'center', justifyContent: 'center', borderWidth: 1.5, borderColor: colors.action, borderRadius: radii.m, paddingHorizontal: spacing.s },
  bandOn: { backgroundColor: colors.action },
  actions: { flexDirection: 'row', gap: spacing.s, marginTop: spacing.m },
});
