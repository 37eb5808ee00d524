import { zodResolver } from '@hookform/resolvers/zod';
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { Button, ErrorText, FormTextField } from '@/components/ui';
import { errorMessage } from '@/hooks/api/client';
import { useSignIn } from '@/hooks/auth/use-auth-actions';
import { signInSchema } from '@/shared/schemas';
import { AuthFrame, AuthLink } from './auth-frame';
import { safeNext } from './safe-next';

export function SignInScreen() {
  const router = useRouter();
  const { next } = useLocalSearchParams<{ next?: string }>();
  const signIn = useSignIn();
  const { control, handleSubmit } = useForm({ resolver: zodResolver(signInSchema), mode: 'onChange', defaultValues: { email: '', password: '' } });
  const submit = handleSubmit((values) => signIn.mutate(values, { onSuccess: () => router.replace(safeNext(next)) }));
  return (
    <AuthFrame title="Sign in" intro="Sign in to your club's field-day plans." testID="sign-in">
      <FormTextField control={control} name="email" label="E-mail" testID="sign-in-email" autoComplete="email" inputMode="email" autoCapitalize="none" onSubmitEditing={submit} />
      <FormTextField control={control} name="password" label="Password" testID="sign-in-password" secureTextEntry autoComplete="current-password" onSubmitEditing={submit} />
      <ErrorText boxed message={signIn.error ? errorMessage(signIn.error) : null} testID="sign-in-error" />
      <Button label="Sign in" testID="sign-in-submit" busy={signIn.isPending} onPress={submit} style={styles.submit} />
      <View style={styles.links}>
        <AuthLink href="/forgot-password" label="Forgot your password?" testID="sign-in-forgot" />
        <AuthLink href="/sign-up" label="New here? Create an account" testID="sign-in-to-sign-up" />
      </View>
    </AuthFrame>
  );
}

const styles = StyleSheet.create({
  submit: { marginTop: spacing.s },
  links: { marginTop: spacing.m },
});
