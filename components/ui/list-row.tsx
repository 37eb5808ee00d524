import { Pressable, StyleSheet, View } from 'react-native';
import type { IconName } from '@/constants/icons';
import { colors, spacing, touchTargetPx } from '@/constants/theme';
import { Icon } from './icon';
import { Txt } from './text';

type Props = {
  title: string;
  subtitle?: string;
  icon?: IconName;
  right?: React.ReactNode;
  onPress?: () => void;
  testID: string;
  accessibilityLabel?: string;
  selected?: boolean;
};

export function ListRow({ title, subtitle, icon, right, onPress, testID, accessibilityLabel, selected }: Props) {
  const body = (
    <>
      {icon ? <Icon name={icon} size={24} color={colors.brandInk} /> : null}
      <View style={styles.text}>
        <Txt variant="bodyStrong">{title}</Txt>
        {subtitle ? <Txt variant="caption" color={colors.inkMuted}>{subtitle}</Txt> : null}
      </View>
      {right}
      {onPress ? <Icon name="chevron-right" size={20} color={colors.inkMuted} /> : null}
    </>
  );
  if (!onPress) {
    return (
      <View style={styles.row} testID={testID} accessibilityLabel={accessibilityLabel ?? title}>
        {body}
      </View>
    );
  }
  return (
    <Pressable
      testID={testID}
      accessibilityRole="link"
      accessibilityLabel={accessibilityLabel ?? title}
      accessibilityState={{ selected: !!selected }}
      onPress={onPress}
      style={({ pressed }) => [styles.row, selected && styles.selected, pressed && styles.pressed]}
    >
      {body}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: {
    minHeight: touchTargetPx + 16,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.m,
    paddingVertical: spacing.s,
    paddingHorizontal: spacing.m,
    borderBottomWidth: 1.5,
    borderBottomColor: colors.lineSoft,
    backgroundColor: colors.surface,
  },
  text: { flex: 1, gap: spacing.xxs },
  selected: { backgroundColor: colors.infoSoft, borderLeftWidth: 4, borderLeftColor: colors.action },
  pressed: { backgroundColor: colors.surfaceSunk },
});
