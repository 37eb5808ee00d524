import { forwardRef, useState } from 'react';
import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';
import { colors, fonts, radii, spacing, touchTargetPx } from '@/constants/theme';
import { ErrorText } from './error-text';
import { Txt } from './text';

export type TextFieldProps = Omit<TextInputProps, 'style'> & {
  label: string;
  testID: string;
  error?: string;
  hint?: string;
  suffix?: string;
  mono?: boolean;
};

export const TextField = forwardRef<TextInput, TextFieldProps>(function TextField(
  { label, testID, error, hint, suffix, mono, multiline, accessibilityLabel, onFocus, onBlur, ...rest },
  ref,
) {
  const [focused, setFocused] = useState(false);
  const border = error ? colors.danger : focused ? colors.focus : colors.line;
  return (
    <View style={styles.wrap}>
      <Txt variant="label" nativeID={`${testID}-label`}>
        {label}
      </Txt>
      <View style={[styles.box, { borderColor: border }, focused && styles.focused, multiline && styles.multi]}>
        <TextInput
          ref={ref}
          testID={testID}
          accessibilityLabel={accessibilityLabel ?? label}
          aria-invalid={!!error}
          placeholderTextColor={colors.inkMuted}
          multiline={multiline}
          onFocus={(e) => {
            setFocused(true);
            onFocus?.(e);
          }}
          onBlur={(e) => {
            setFocused(false);
            onBlur?.(e);
          }}
          style={[styles.input, mono && styles.mono, multiline && styles.multiInput]}
          {...rest}
        />
        {suffix ? (
          <Txt variant="bodyStrong" color={colors.inkMuted} style={styles.suffix}>
            {suffix}
          </Txt>
        ) : null}
      </View>
      {hint && !error ? (
        <Txt variant="caption" color={colors.inkMuted}>
          {hint}
        </Txt>
      ) : null}
      <ErrorText message={error} testID={`${testID}-error`} />
    </View>
  );
});

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs, marginBottom: spacing.l },
  box: {
    minHeight: touchTargetPx + 4,
    borderWidth: 2,
    borderRadius: radii.m,
    backgroundColor: colors.surface,
    flexDirection: 'row',
    alignItems: 'center',
  },
  focused: { borderWidth: 3 },
  multi: { alignItems: 'flex-start' },
  input: {
    flex: 1,
    minHeight: touchTargetPx,
    paddingHorizontal: spacing.m,
    fontFamily: fonts.regular,
    fontSize: 17,
    color: colors.ink,
    // react-native-web draws its own outline on focus; the thicker orange border is ours.
    outlineStyle: 'none',
  } as object,
  mono: { fontFamily: fonts.mono },
  multiInput: { minHeight: 110, paddingTop: spacing.m, textAlignVertical: 'top' },
  suffix: { paddingRight: spacing.m },
});
