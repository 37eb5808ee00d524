import { StyleSheet, View } from 'react-native';
import type { StateLook } from '@/constants/states';
import { radii, spacing } from '@/constants/theme';
import { Icon } from './icon';
import { Txt } from './text';

/** A state as icon + word on its colour: never colour alone. */
export function Badge({ look, label, testID }: { look: Pick<StateLook, 'label' | 'icon' | 'fg' | 'bg' | 'border'>; label?: string; testID?: string }) {
  return (
    <View style={[styles.badge, { backgroundColor: look.bg, borderColor: look.border }]} testID={testID} accessibilityLabel={label ?? look.label}>
      <Icon name={look.icon} size={16} color={look.fg} />
      <Txt variant="caption" color={look.fg} style={styles.text}>
        {label ?? look.label}
      </Txt>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: spacing.xs,
    paddingHorizontal: spacing.s,
    paddingVertical: spacing.xxs,
    borderRadius: radii.pill,
    borderWidth: 1.5,
  },
  text: { fontSize: 14 },
});
