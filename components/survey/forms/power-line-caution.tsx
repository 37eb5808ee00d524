import { StyleSheet, View } from 'react-native';
import { Icon, Txt } from '@/components/ui';
import { colors, radii, spacing } from '@/constants/theme';
import { CAUTION_LINES } from '@/shared/clearance/cautions';
import { POWER_LINE_CAUTION } from './hazard-form-logic';

/** The danger notice on every power-line form and record: icon, words and colour together. */
export function PowerLineCaution({ testID = 'power-line-caution' }: { testID?: string }) {
  return (
    <View style={styles.box} testID={testID} accessibilityRole="alert">
      <View style={styles.head}>
        <Icon name="triangle-alert" size={26} color={colors.danger} />
        <Txt variant="bodyStrong" color={colors.danger} style={styles.grow}>{POWER_LINE_CAUTION}</Txt>
      </View>
      {CAUTION_LINES.map((l) => <Txt key={l} variant="caption" color={colors.ink}>• {l}</Txt>)}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { backgroundColor: colors.dangerSoft, borderColor: colors.danger, borderWidth: 2, borderRadius: radii.m, padding: spacing.m, gap: spacing.xs, marginBottom: spacing.l },
  head: { flexDirection: 'row', gap: spacing.s, alignItems: 'flex-start' },
  grow: { flex: 1 },
});
