import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, ErrorText, Select, Tabular, TextField, Txt } from '@/components/ui';
import { colors, radii, spacing } from '@/constants/theme';
import { useFixAveraging } from '@/hooks/survey/use-fix-averaging';
import type { PositionState } from '@/hooks/survey/use-position';
import { useUnits } from '@/hooks/use-units';
import { MIN_READINGS, fixMeasurementInputs, offsetMeasurementInputs, placeByOffset } from './placement-logic';
import { surveyGeo } from './survey-geo';

export type Placement = {
  lat: number;
  lon: number;
  accuracyM: number;
  /** Kept as a `measurements` record of kind 'gps-fix'. */
  measurement: { method: 'averaged-fix' | 'offset'; inputs: Record<string, number | string>; valueM: number };
};

type Props = {
  position: PositionState;
  value: Placement | null;
  onChange: (p: Placement | null) => void;
  testID: string;
  /** What is being placed, for the words on screen ("the tree"). */
  what: string;
  error?: string;
};

/** "Here" (averaging GPS readings while the scout waits) or "from here" (distance and bearing). */
export function PlacementPicker({ position, value, onChange, testID, what, error }: Props) {
  const { lengthToM, lengthUnit, formatLengthM } = useUnits();
  const [mode, setMode] = useState<'here' | 'offset'>('here');
  const [running, setRunning] = useState(true);
  const { readings, fix, restart } = useFixAveraging(position.latest, running);
  const [distanceText, setDistance] = useState('');
  const [bearingText, setBearing] = useState('');
  const offset = placeByOffset(fix, { distanceText, bearingText }, lengthToM, surveyGeo);
  const enough = !!fix && fix.count >= MIN_READINGS;

  // Keep the parent's placement in step with the offset fields as the scout types.
  useEffect(() => {
    if (mode !== 'offset' || !fix) return;
    if (offset.ok) onChange({ lat: offset.at.lat, lon: offset.at.lon, accuracyM: offset.accuracyM, measurement: { method: 'offset', inputs: offsetMeasurementInputs(fix, offset), valueM: offset.accuracyM } });
    else if (value?.measurement.method === 'offset') onChange(null);
  }, [mode, distanceText, bearingText, fix?.lat, fix?.lon, fix?.accuracyM]);

  const useFix = () => {
    if (!fix) return;
    setRunning(false);
    onChange({ lat: fix.lat, lon: fix.lon, accuracyM: fix.accuracyM, measurement: { method: 'averaged-fix', inputs: fixMeasurementInputs(fix, readings), valueM: fix.accuracyM } });
  };

  return (
    <View style={styles.box} testID={testID}>
      <Select label={`Where is ${what}?`} testID={`${testID}-mode`} value={mode} onChange={(m) => { setMode(m); onChange(null); setRunning(true); }}
        options={[{ value: 'here', label: 'Where I stand' }, { value: 'offset', label: 'Distance and bearing from me' }]} />
      {position.message ? <ErrorText message={position.message} testID={`${testID}-position-error`} boxed /> : null}
      <View style={styles.fixRow}>
        <View style={styles.fixText}>
          <Txt variant="label">{mode === 'here' ? 'GPS fix, averaged' : 'Where you stand'}</Txt>
          <Tabular testID={`${testID}-fix-status`}>
            {fix ? `${fix.count} ${fix.count === 1 ? 'reading' : 'readings'} · ±${formatLengthM(fix.accuracyM)}` : position.status === 'starting' ? 'Waiting for the first reading…' : 'No readings yet'}
          </Tabular>
          <Txt variant="caption" color={colors.inkMuted}>
            {mode === 'offset'
              ? 'The point is placed from your averaged position, which improves while you stand still.'
              : running ? (enough ? 'Keep still: more readings make it better. Use it when the accuracy stops improving.' : `Hold still for at least ${MIN_READINGS} readings…`) : 'Fix taken.'}
          </Txt>
        </View>
        {running ? null : <Button label="Again" testID={`${testID}-restart`} variant="quiet" compact onPress={() => { restart(); setRunning(true); if (mode === 'here') onChange(null); }} />}
      </View>
      {mode === 'here' ? (
        value?.measurement.method === 'averaged-fix' ? (
          <Txt testID={`${testID}-taken`} color={colors.ok} variant="bodyStrong">Placed here, good to ±{formatLengthM(value.accuracyM)}</Txt>
        ) : (
          <Button label={enough ? `Use this fix (±${formatLengthM(fix!.accuracyM)})` : 'Waiting for readings…'} testID={`${testID}-use-fix`} icon="crosshair" disabled={!enough} onPress={useFix} />
        )
      ) : (
        <View>
          <TextField label={`Distance to ${what}`} testID={`${testID}-distance`} suffix={lengthUnit} inputMode="decimal" keyboardType="decimal-pad" value={distanceText} onChangeText={setDistance}
            error={distanceText ? (offset.ok ? undefined : offset.errors.distance) : undefined} hint="Level distance: paced, taped or from a rangefinder" />
          <TextField label="Bearing from you" testID={`${testID}-bearing`} suffix="°" inputMode="decimal" keyboardType="decimal-pad" value={bearingText} onChangeText={setBearing}
            error={bearingText ? (offset.ok ? undefined : offset.errors.bearing) : undefined} hint="Degrees from true north (a compass reads magnetic north: add the local declination)" />
          {offset.ok ? <Tabular testID={`${testID}-offset-result`}>Placed {formatLengthM(offset.distanceM)} at {Math.round(offset.bearingDeg)}°, good to ±{formatLengthM(offset.accuracyM)}</Tabular> : null}
        </View>
      )}
      <ErrorText message={error} testID={`${testID}-error`} />
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 2, borderColor: colors.lineSoft, borderRadius: radii.l, padding: spacing.m, marginBottom: spacing.l, backgroundColor: colors.surface, gap: spacing.s },
  fixRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.s },
  fixText: { flex: 1, gap: spacing.xxs },
});
