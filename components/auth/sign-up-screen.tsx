import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'expo-router';
import { useForm } from 'react-hook-form';
import { StyleSheet } from 'react-native';
import { spacing } from '@/constants/theme';
import { Button, ErrorText, FormTextField } from '@/components/ui';
import { errorMessage, fieldErrors } from '@/hooks/api/client';
import { useSignUp } from '@/hooks/auth/use-auth-actions';
import { signUpSchema } from '@/shared/schemas';
import { AuthFrame, AuthLink } from './auth-frame';

export function SignUpScreen() {
  const router = useRouter();
  const signUp = useSignUp();
  const { control, handleSubmit } = useForm({
    resolver: zodResolver(signUpSchema),
    mode: 'onChange',
    defaultValues: { email: '', password: '', displayName: '', callSign: '' },
  });
  const server = fieldErrors(signUp.error);
  const submit = handleSubmit((values) => signUp.mutate({ ...values, callSign: values.callSign ?? '' }, { onSuccess: () => router.replace('/') }));
  return (
    <AuthFrame title="Create your account" intro="Then start a club, or open the invitation link your club sent you." testID="sign-up">
      <FormTextField control={control} name="displayName" label="Your name" testID="sign-up-name" autoComplete="name" serverError={server.displayName} />
      <FormTextField control={control} name="callSign" label="Call sign (optional)" testID="sign-up-call-sign" autoCapitalize="characters" mono hint="Such as K0XYZ. Leave empty if you are not licensed yet." serverError={server.callSign} />
      <FormTextField control={control} name="email" label="E-mail" testID="sign-up-email" autoComplete="email" inputMode="email" autoCapitalize="none" serverError={server.email} />
      <FormTextField control={control} name="password" label="Password" testID="sign-up-password" secureTextEntry autoComplete="new-password" hint="At least 10 characters." serverError={server.password} />
      <ErrorText boxed message={signUp.error ? errorMessage(signUp.error) : null} testID="sign-up-error" />
      <Button label="Create account" testID="sign-up-submit" busy={signUp.isPending} onPress={submit} style={styles.submit} />
      <AuthLink href="/sign-in" label="Already have an account? Sign in" testID="sign-up-to-sign-in" />
    </AuthFrame>
  );
}

const styles = StyleSheet.create({ submit: { marginTop: spacing.s } });
