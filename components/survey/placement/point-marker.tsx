import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Tabular, TextField, Txt } from '@/components/ui';
import { colors, radii, spacing } from '@/constants/theme';
import { useFixAveraging } from '@/hooks/survey/use-fix-averaging';
import type { PositionState } from '@/hooks/survey/use-position';
import { useUnits } from '@/hooks/use-units';
import type { LatLon } from '@/shared/schemas';
import { placeByOffset } from './placement-logic';
import { surveyGeo } from './survey-geo';

/**
 * Marking the points of a line or the corners of an area one by one: stop under the line (at a pole, where
 * it crosses a path), let the readings settle, mark; or place the point by distance and bearing when it
 * cannot be walked to. Readings restart after every mark so each point averages only its own.
 */
export function PointMarker({ position, points, onPoints, testID, noun }: { position: PositionState; points: LatLon[]; onPoints: (p: LatLon[]) => void; testID: string; noun: string }) {
  const { lengthToM, lengthUnit, formatLengthM } = useUnits();
  const { fix, restart } = useFixAveraging(position.latest, true);
  const [byOffset, setByOffset] = useState(false);
  const [distanceText, setDistance] = useState('');
  const [bearingText, setBearing] = useState('');
  const offset = placeByOffset(fix, { distanceText, bearingText }, lengthToM, surveyGeo);
  const add = (p: LatLon) => { onPoints([...points, p]); restart(); setDistance(''); setBearing(''); };
  return (
    <View style={styles.box} testID={testID}>
      <Txt variant="label">{points.length} {noun}{points.length === 1 ? '' : 's'} marked</Txt>
      {points.map((p, i) => (
        <View key={`${i}-${p.lat}-${p.lon}`} style={styles.pointRow} testID={`${testID}-point-${i}`}>
          <Tabular style={styles.grow}>{i + 1}. {p.lat.toFixed(6)}, {p.lon.toFixed(6)}</Tabular>
          <Button label="Remove" testID={`${testID}-remove-${i}`} variant="quiet" compact onPress={() => onPoints(points.filter((_, j) => j !== i))} />
        </View>
      ))}
      <Tabular testID={`${testID}-fix-status`}>{fix ? `Here: ${fix.count} ${fix.count === 1 ? 'reading' : 'readings'} · ±${formatLengthM(fix.accuracyM)}` : position.message ?? 'Waiting for a GPS reading…'}</Tabular>
      {byOffset ? (
        <View>
          <TextField label={`Distance to the ${noun}`} testID={`${testID}-distance`} suffix={lengthUnit} inputMode="decimal" value={distanceText} onChangeText={setDistance} error={distanceText && !offset.ok ? offset.errors.distance : undefined} />
          <TextField label="Bearing from you" testID={`${testID}-bearing`} suffix="°" inputMode="decimal" value={bearingText} onChangeText={setBearing} error={bearingText && !offset.ok ? offset.errors.bearing : undefined} hint="Degrees from true north" />
          <View style={styles.row}>
            <Button label={`Add ${noun}`} testID={`${testID}-add-offset`} disabled={!offset.ok} onPress={() => offset.ok && add(offset.at)} />
            <Button label="Back" testID={`${testID}-offset-cancel`} variant="quiet" onPress={() => setByOffset(false)} />
          </View>
        </View>
      ) : (
        <View style={styles.row}>
          <Button label={`Mark ${noun} here`} icon="crosshair" testID={`${testID}-mark`} disabled={!fix} onPress={() => fix && add({ lat: fix.lat, lon: fix.lon })} style={styles.grow} />
          <Button label="By distance" testID={`${testID}-by-offset`} variant="secondary" onPress={() => setByOffset(true)} />
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 2, borderColor: colors.lineSoft, borderRadius: radii.l, padding: spacing.m, gap: spacing.s, marginBottom: spacing.l, backgroundColor: colors.surface },
  pointRow: { flexDirection: 'row', alignItems: 'center' },
  row: { flexDirection: 'row', gap: spacing.s, flexWrap: 'wrap' },
  grow: { flex: 1 },
});
