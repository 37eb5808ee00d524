import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/constants/theme';
import { Icon } from './icon';
import { Txt } from './text';

/** An error in plain words, with an icon so it does not rely on red alone. Renders nothing without a message. */
export function ErrorText({ message, testID, boxed }: { message?: string | null; testID?: string; boxed?: boolean }) {
  if (!message) return null;
  return (
    <View style={[styles.row, boxed && styles.box]} testID={testID} accessibilityRole="alert" accessibilityLiveRegion="polite">
      <Icon name="triangle-alert" size={18} color={colors.danger} />
      <Txt variant="caption" color={colors.danger} style={styles.text}>
        {message}
      </Txt>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: spacing.s, alignItems: 'flex-start', marginTop: spacing.xs },
  box: { backgroundColor: colors.dangerSoft, borderColor: colors.danger, borderWidth: 1.5, borderRadius: radii.m, padding: spacing.m },
  text: { flex: 1, fontSize: 15 },
});
