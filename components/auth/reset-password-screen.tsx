import { zodResolver } from '@hookform/resolvers/zod';
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Button, ErrorText, FormTextField } from '@/components/ui';
import { errorMessage } from '@/hooks/api/client';
import { useResetPassword } from '@/hooks/auth/use-auth-actions';
import { passwordSchema } from '@/shared/schemas';
import { AuthFrame, AuthLink } from './auth-frame';

const formSchema = z
  .strictObject({ password: passwordSchema, confirm: z.string() })
  .refine((v) => v.password === v.confirm, { message: 'the two passwords differ', path: ['confirm'] });

/** Opened from the e-mailed link /reset-password?token=… */
export function ResetPasswordScreen() {
  const router = useRouter();
  const { token } = useLocalSearchParams<{ token?: string }>();
  const reset = useResetPassword();
  const { control, handleSubmit } = useForm({ resolver: zodResolver(formSchema), mode: 'onChange', defaultValues: { password: '', confirm: '' } });
  if (!token || token.length < 20) {
    return (
      <AuthFrame title="This reset link is incomplete" intro="Open the link from the e-mail again, or ask for a new one." testID="reset">
        <AuthLink href="/forgot-password" label="Ask for a new reset link" testID="reset-ask-again" />
      </AuthFrame>
    );
  }
  const submit = handleSubmit(({ password }) => reset.mutate({ token, password }));
  if (reset.isSuccess) {
    return (
      <AuthFrame title="Password changed" intro="Sign in with your new password." testID="reset">
        <Button label="Sign in" testID="reset-done-sign-in" onPress={() => router.replace('/sign-in')} />
      </AuthFrame>
    );
  }
  return (
    <AuthFrame title="Choose a new password" intro="At least 10 characters. A short sentence is easy to remember and hard to guess." testID="reset">
      <FormTextField control={control} name="password" label="New password" testID="reset-password" secureTextEntry autoComplete="new-password" />
      <FormTextField control={control} name="confirm" label="The same password again" testID="reset-confirm" secureTextEntry autoComplete="new-password" onSubmitEditing={submit} />
      <ErrorText boxed message={reset.error ? errorMessage(reset.error) : null} testID="reset-error" />
      <Button label="Save the new password" testID="reset-submit" busy={reset.isPending} onPress={submit} />
      <AuthLink href="/forgot-password" label="Link expired? Ask for a new one" testID="reset-ask-again" />
    </AuthFrame>
  );
}
