import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Select, Tabular, TextField, Txt } from '@/components/ui';
import { colors, radii, spacing } from '@/constants/theme';
import { useUnits } from '@/hooks/use-units';
import { TiltButton } from '../clinometer/tilt-button';
import { DEFAULT_EYE_HEIGHT_M, HEIGHT_METHODS, checkHeight, emptyHeightTexts, type HeightMethod, type HeightTexts } from './height-form-logic';
import { heightMath } from './height-math';

export type MeasuredHeight = { heightM: number; method: HeightMethod; inputs: Record<string, number> };

const METHOD_LABEL: Record<HeightMethod, string> = { tangent: 'Level ground', 'two-angle': 'Sloping ground', percent: 'Percent scale', sine: 'Rangefinder' };
const METHOD_HOW: Record<HeightMethod, string> = {
  tangent: 'Stand back about the tree’s height on level ground. Measure the level distance to the trunk, then the angle up to the highest point a line could go over.',
  'two-angle': 'On a slope: the level distance to the trunk, the angle up to the top and the angle to the base (negative when the base is below your eyes).',
  percent: 'With a percent-scale clinometer: the level distance, the reading at the top and at the base (negative below eye level).',
  sine: 'With a laser rangefinder: the slant distance straight to the top and the angle it shows, plus your eye height (level ground).',
};

/** The guided height measurement. Reports a result only when the readings make sense. */
export function HeightMeasure({ onResult, testID }: { onResult: (r: MeasuredHeight | null) => void; testID: string }) {
  const { lengthToM, mToLength, lengthUnit, formatLengthM } = useUnits();
  const [method, setMethod] = useState<HeightMethod>('tangent');
  const [t, setT] = useState<HeightTexts>(() => emptyHeightTexts(String(Math.round(mToLength(DEFAULT_EYE_HEIGHT_M) * 10) / 10)));
  const r = checkHeight(method, t, lengthToM, heightMath);
  const anyTyped = Object.entries(t).some(([k, v]) => k !== 'eyeHeight' && v.trim() !== '');
  useEffect(() => {
    onResult(r.ok ? { heightM: r.heightM, method: r.method, inputs: r.inputs } : null);
  }, [r.ok ? `${r.method}:${r.heightM}` : 'none']);
  const set = (k: keyof HeightTexts) => (v: string) => setT((old) => ({ ...old, [k]: v }));
  const err = (k: keyof HeightTexts) => (!r.ok && t[k].trim() !== '' ? r.errors[k] : undefined);
  const angleUnit = method === 'percent' ? '%' : '°';
  return (
    <View style={styles.box} testID={testID}>
      <Select label="How are you measuring?" testID={`${testID}-method`} value={method} onChange={setMethod} options={HEIGHT_METHODS.map((m) => ({ value: m, label: METHOD_LABEL[m] }))} />
      <Txt variant="caption" color={colors.inkMuted} style={styles.how}>{METHOD_HOW[method]}</Txt>
      {method === 'sine'
        ? <TextField label="Slant distance to the top" testID={`${testID}-slant`} suffix={lengthUnit} inputMode="decimal" value={t.slant} onChangeText={set('slant')} error={err('slant')} />
        : <TextField label="Level distance to the trunk" testID={`${testID}-distance`} suffix={lengthUnit} inputMode="decimal" value={t.distance} onChangeText={set('distance')} error={err('distance')} />}
      <TextField label={method === 'sine' ? 'Angle to the top' : method === 'percent' ? 'Reading to the top' : 'Angle to the top'} testID={`${testID}-top`} suffix={angleUnit} inputMode="decimal" value={t.top} onChangeText={set('top')} error={err('top')} />
      {method !== 'percent' ? <TiltButton target="top" testID={`${testID}-tilt-top`} onAngle={(deg) => set('top')(String(deg))} /> : null}
      {method === 'two-angle' || method === 'percent' ? (
        <>
          <TextField label={method === 'percent' ? 'Reading to the base' : 'Angle to the base'} testID={`${testID}-base`} suffix={angleUnit} inputMode="decimal" value={t.base} onChangeText={set('base')} error={err('base')} hint="Negative when the base is below your eyes" />
          {method === 'two-angle' ? <TiltButton target="base" testID={`${testID}-tilt-base`} onAngle={(deg) => set('base')(String(deg))} /> : null}
        </>
      ) : (
        <TextField label="Your eye height" testID={`${testID}-eye`} suffix={lengthUnit} inputMode="decimal" value={t.eyeHeight} onChangeText={set('eyeHeight')} error={err('eyeHeight')} />
      )}
      {r.ok ? (
        <View style={styles.result} testID={`${testID}-result`}>
          <Txt variant="label">Height</Txt>
          <Tabular size={26} strong>{formatLengthM(r.heightM)}</Tabular>
        </View>
      ) : anyTyped ? <Txt variant="caption" color={colors.inkMuted}>Fill in the readings above to get the height.</Txt> : null}
      {r.questions.map((q) => <Txt key={q} color={colors.warning} variant="caption">⚠ {q}</Txt>)}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 2, borderColor: colors.lineSoft, borderRadius: radii.l, padding: spacing.m, marginBottom: spacing.l, backgroundColor: colors.surface },
  how: { marginBottom: spacing.m },
  result: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.m, padding: spacing.s, backgroundColor: colors.okSoft, borderRadius: radii.m, marginTop: spacing.s },
});
