import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/constants/theme';
import { Button, ErrorText, FormTextField, Icon, Txt } from '@/components/ui';
import { errorMessage } from '@/hooks/api/client';
import { useForgotPassword } from '@/hooks/auth/use-auth-actions';
import { forgotPasswordSchema } from '@/shared/schemas';
import { AuthFrame, AuthLink } from './auth-frame';

export function ForgotPasswordScreen() {
  const forgot = useForgotPassword();
  const { control, handleSubmit, getValues } = useForm({ resolver: zodResolver(forgotPasswordSchema), mode: 'onChange', defaultValues: { email: '' } });
  const submit = handleSubmit((values) => forgot.mutate(values));
  return (
    <AuthFrame title="Reset your password" intro="Give the e-mail you signed up with. We send a link to choose a new password." testID="forgot">
      {forgot.isSuccess ? (
        <View style={styles.sent} testID="forgot-sent" accessibilityRole="alert">
          <Icon name="mail" size={28} color={colors.ok} />
          <Txt style={styles.sentText}>
            If {getValues('email')} has a Loftline account, a reset link is on its way. It works for one hour. Check the spam folder too.
          </Txt>
        </View>
      ) : (
        <>
          <FormTextField control={control} name="email" label="E-mail" testID="forgot-email" autoComplete="email" inputMode="email" autoCapitalize="none" onSubmitEditing={submit} />
          <ErrorText boxed message={forgot.error ? errorMessage(forgot.error) : null} testID="forgot-error" />
          <Button label="Send the reset link" icon="mail" testID="forgot-submit" busy={forgot.isPending} onPress={submit} />
        </>
      )}
      <AuthLink href="/sign-in" label="Back to sign in" testID="forgot-to-sign-in" />
    </AuthFrame>
  );
}

const styles = StyleSheet.create({
  sent: { flexDirection: 'row', gap: spacing.m, padding: spacing.l, backgroundColor: colors.okSoft, borderRadius: radii.m, borderWidth: 1.5, borderColor: colors.ok },
  sentText: { flex: 1 },
});
