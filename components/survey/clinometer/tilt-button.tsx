import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Tabular, Txt } from '@/components/ui';
import { colors, radii, spacing } from '@/constants/theme';
import { useTilt } from '@/hooks/survey/use-tilt';
import { steadyAngle } from './tilt-angle';

/**
 * Read an angle with the phone itself: hold it flat against your cheek with its top edge pointing along
 * your line of sight at the treetop (or the base), wait for "steady", tap to take the angle. Where the
 * device has no tilt sensor the angle is simply typed.
 */
export function TiltButton({ target, onAngle, testID }: { target: 'top' | 'base'; onAngle: (deg: number) => void; testID: string }) {
  const tilt = useTilt();
  const [open, setOpen] = useState(false);
  const [now, setNow] = useState(Date.now());
  useEffect(() => {
    if (!open) return;
    const t = setInterval(() => setNow(Date.now()), 200);
    return () => clearInterval(t);
  }, [open]);
  const s = steadyAngle(tilt.readings, now);
  if (tilt.status === 'unsupported') return null;
  if (!open) {
    return <Button label={`Measure with the phone's tilt`} icon="crosshair" variant="quiet" compact testID={`${testID}-open`} onPress={() => { setOpen(true); void tilt.start(); }} />;
  }
  return (
    <View style={styles.box} testID={testID}>
      <Txt variant="caption">Hold the phone upright-flat with its top edge pointing at the {target === 'top' ? 'treetop' : 'base of the trunk'}, sighting along the edge. Keep still.</Txt>
      {tilt.status === 'denied' ? <Txt color={colors.danger}>Motion sensors are not allowed: type the angle instead.</Txt> : null}
      <Tabular size={28} strong testID={`${testID}-reading`}>{s ? `${s.meanDeg.toFixed(1)}°` : '—'}</Tabular>
      <Txt variant="caption" color={s?.steady ? colors.ok : colors.warning}>
        {!s ? 'No tilt readings yet: this device may have no tilt sensor. Type the angle instead.' : s.steady ? 'Steady: take it' : 'Hold still…'}
      </Txt>
      <View style={styles.row}>
        <Button label="Take this angle" testID={`${testID}-take`} disabled={!s?.steady} onPress={() => { if (s) onAngle(Math.round(s.meanDeg * 10) / 10); tilt.stop(); setOpen(false); }} />
        <Button label="Type it" variant="quiet" testID={`${testID}-cancel`} onPress={() => { tilt.stop(); setOpen(false); }} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 2, borderColor: colors.action, borderRadius: radii.m, padding: spacing.m, gap: spacing.s, marginBottom: spacing.m, backgroundColor: colors.infoSoft },
  row: { flexDirection: 'row', gap: spacing.s, flexWrap: 'wrap' },
});
