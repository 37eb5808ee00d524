import { ActivityIndicator, Pressable, StyleSheet, View, type StyleProp, type ViewStyle } from 'react-native';
import type { IconName } from '@/constants/icons';
import { colors, radii, spacing, touchTargetPx } from '@/constants/theme';
import { Icon } from './icon';
import { Txt } from './text';

type Variant = 'primary' | 'secondary' | 'danger' | 'quiet';

type Props = {
  label: string;
  onPress?: () => void;
  testID: string;
  accessibilityLabel?: string;
  variant?: Variant;
  icon?: IconName;
  disabled?: boolean;
  busy?: boolean;
  style?: StyleProp<ViewStyle>;
  compact?: boolean;
};

const look: Record<Variant, { bg: string; fg: string; border: string; pressed: string }> = {
  primary: { bg: colors.action, fg: colors.onAction, border: colors.action, pressed: colors.actionPressed },
  secondary: { bg: colors.surface, fg: colors.action, border: colors.action, pressed: colors.infoSoft },
  danger: { bg: colors.surface, fg: colors.danger, border: colors.danger, pressed: colors.dangerSoft },
  quiet: { bg: 'transparent', fg: colors.action, border: 'transparent', pressed: colors.infoSoft },
};

export function Button({ label, onPress, testID, accessibilityLabel, variant = 'primary', icon, disabled, busy, style, compact }: Props) {
  const l = look[variant];
  const off = disabled || busy;
  return (
    <Pressable
      testID={testID}
      accessibilityRole="button"
      accessibilityLabel={accessibilityLabel ?? label}
      accessibilityState={{ disabled: !!off, busy: !!busy }}
      disabled={off}
      onPress={onPress}
      style={({ pressed }) => [
        styles.base,
        compact && styles.compact,
        { backgroundColor: pressed ? l.pressed : l.bg, borderColor: l.border, opacity: off && !busy ? 0.55 : 1 },
        style,
      ]}
    >
      <View style={styles.row}>
        {busy ? <ActivityIndicator color={l.fg} /> : icon ? <Icon name={icon} size={20} color={l.fg} /> : null}
        <Txt variant="label" color={l.fg} style={styles.label}>
          {label}
        </Txt>
      </View>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    minHeight: touchTargetPx,
    minWidth: touchTargetPx,
    paddingHorizontal: spacing.l,
    borderRadius: radii.m,
    borderWidth: 2,
    justifyContent: 'center',
    alignItems: 'center',
  },
  compact: { paddingHorizontal: spacing.m },
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.s },
  label: { fontSize: 16 },
});
