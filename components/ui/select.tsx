import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radii, spacing, touchTargetPx } from '@/constants/theme';
import { ErrorText } from './error-text';
import { Icon } from './icon';
import { Txt } from './text';

export type SelectOption<V extends string> = { value: V; label: string; hint?: string };

type Props<V extends string> = {
  label: string;
  testID: string;
  options: readonly SelectOption<V>[];
  value: V | null | undefined;
  onChange: (v: V) => void;
  error?: string;
  disabled?: boolean;
};

/**
 * A choice among a few named options, shown all at once as large buttons (a radio group): quicker with
 * one thumb than a dropdown, and every option stays readable.
 */
export function Select<V extends string>({ label, testID, options, value, onChange, error, disabled }: Props<V>) {
  return (
    <View style={styles.wrap} accessibilityRole="radiogroup" accessibilityLabel={label} testID={testID}>
      <Txt variant="label">{label}</Txt>
      <View style={styles.options}>
        {options.map((o) => {
          const selected = o.value === value;
          return (
            <Pressable
              key={o.value}
              testID={`${testID}-${o.value}`}
              accessibilityRole="radio"
              accessibilityLabel={o.label}
              accessibilityState={{ selected, checked: selected, disabled }}
              disabled={disabled}
              onPress={() => onChange(o.value)}
              style={({ pressed }) => [
                styles.option,
                selected ? styles.selected : null,
                pressed && !selected ? styles.pressed : null,
                disabled ? styles.disabled : null,
              ]}
            >
              {selected ? <Icon name="check-circle" size={18} color={colors.onAction} /> : null}
              <Txt variant="label" color={selected ? colors.onAction : colors.ink}>
                {o.label}
              </Txt>
            </Pressable>
          );
        })}
      </View>
      <ErrorText message={error} testID={`${testID}-error`} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs, marginBottom: spacing.l },
  options: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.s },
  option: {
    minHeight: touchTargetPx,
    paddingHorizontal: spacing.m,
    borderRadius: radii.m,
    borderWidth: 2,
    borderColor: colors.line,
    backgroundColor: colors.surface,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.xs,
  },
  selected: { backgroundColor: colors.ink, borderColor: colors.ink },
  pressed: { backgroundColor: colors.surfaceSunk },
  disabled: { opacity: 0.55 },
});
