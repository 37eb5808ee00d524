import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '@/constants/theme';
import { Icon } from '@/components/ui/icon';
import { Txt } from '@/components/ui/text';

/** The Loftline mark: a line lofted from a tall support to a short one, in throw-line orange. */
export function BrandMark({ onDark, size = 'm', markOnly }: { onDark?: boolean; size?: 'm' | 'l'; markOnly?: boolean }) {
  const big = size === 'l';
  return (
    <View style={styles.row} accessibilityLabel="Loftline">
      <View style={[styles.tile, big && styles.tileBig]}>
        <Icon name="logo" size={big ? 34 : 24} color={colors.onAction} />
      </View>
      {markOnly ? null : (
        <Txt variant={big ? 'display' : 'title'} color={onDark ? colors.onShellBar : colors.ink} style={styles.word}>
          Loftline
        </Txt>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.s },
  tile: { backgroundColor: colors.brand, borderRadius: 8, width: 36, height: 36, alignItems: 'center', justifyContent: 'center' },
  tileBig: { width: 52, height: 52, borderRadius: 12 },
  word: { letterSpacing: -0.3 },
});
