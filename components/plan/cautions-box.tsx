import { StyleSheet, View } from 'react-native';
import { Icon, Txt } from '@/components/ui';
import { colors, radii, spacing } from '@/constants/theme';
import { CAUTION_LINES } from '@/shared/plan';

/** The cautions that travel with every clearance, fall-zone and exposure figure. */
export function CautionsBox({ testID = 'cautions' }: { testID?: string }) {
  return (
    <View style={styles.box} testID={testID} accessibilityRole="summary" accessibilityLabel={`Cautions: ${CAUTION_LINES.join(' ')}`}>
      <View style={styles.head}>
        <Icon name="triangle-alert" size={20} color={colors.warning} />
        <Txt variant="label" color={colors.warning}>Cautions</Txt>
      </View>
      {CAUTION_LINES.map((l) => (
        <Txt key={l} variant="caption">• {l}</Txt>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 1.5, borderColor: colors.warning, backgroundColor: colors.warningSoft, borderRadius: radii.m, padding: spacing.m, gap: spacing.xs, marginVertical: spacing.s },
  head: { flexDirection: 'row', alignItems: 'center', gap: spacing.s },
});
