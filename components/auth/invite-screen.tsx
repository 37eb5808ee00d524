import { zodResolver } from '@hookform/resolvers/zod';
import { Redirect, useRouter } from 'expo-router';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';
import { colors, radii, spacing } from '@/constants/theme';
import { Button, ErrorText, FormTextField, Icon, Txt } from '@/components/ui';
import { errorMessage, fieldErrors } from '@/hooks/api/client';
import { useAcceptInvitation, useInvitationPreview, type InvitationPreview } from '@/hooks/api/use-invitations';
import { useSession } from '@/hooks/auth/use-session';
import { callSignSchema, nameText, passwordSchema, ROLE_LABELS } from '@/shared/schemas';
import { formatDayRange } from '@/components/events/day-range';
import { AuthFrame, AuthLink } from './auth-frame';

const joinSchema = z.strictObject({ displayName: nameText(80, 'name'), callSign: callSignSchema, password: passwordSchema });

/** /invite/<token>: join a club, signed in already or signing up in the same step. */
export function InviteScreen({ token }: { token: string }) {
  const preview = useInvitationPreview(token);
  const { user } = useSession();
  // Held here, not in the forms: accepting signs the person in, which re-renders this screen.
  const accept = useAcceptInvitation();
  if (accept.isSuccess) return <Redirect href="/" />;
  if (preview.isLoading) return <AuthFrame title="Opening the invitation…" testID="invite">{null}</AuthFrame>;
  if (preview.isError || !preview.data) {
    return (
      <AuthFrame title="This invitation cannot be used" intro={errorMessage(preview.error)} testID="invite">
        <Txt color={colors.inkMuted}>An invitation works once and only until its date. If you still need to join, ask the club's admin to send a new one.</Txt>
        <AuthLink href="/" label="Go to Loftline" testID="invite-home" />
      </AuthFrame>
    );
  }
  const inv = preview.data;
  return (
    <AuthFrame title={`Join ${inv.clubName}`} testID="invite">
      <Summary inv={inv} />
      {user ? (
        <JoinSignedIn token={token} inv={inv} email={user.email} accept={accept} />
      ) : inv.needsSignUp ? (
        <JoinWithSignUp token={token} inv={inv} accept={accept} />
      ) : (
        <SignInFirst token={token} inv={inv} />
      )}
    </AuthFrame>
  );
}

function Summary({ inv }: { inv: InvitationPreview }) {
  return (
    <View style={styles.summary} testID="invite-summary">
      <Icon name="mail" size={28} color={colors.action} />
      <View style={styles.summaryText}>
        <Txt variant="bodyStrong">
          {inv.clubName} invites {inv.email} as {ROLE_LABELS[inv.role]}.
        </Txt>
        <Txt variant="caption" color={colors.inkMuted}>
          The invitation works until {formatDayRange(inv.expiresAt.slice(0, 10), inv.expiresAt.slice(0, 10))}, {inv.expiresAt.slice(11, 16)} UTC.
        </Txt>
      </View>
    </View>
  );
}

type Accept = ReturnType<typeof useAcceptInvitation>;

function JoinSignedIn({ token, inv, email, accept }: { token: string; inv: InvitationPreview; email: string; accept: Accept }) {
  const other = email.toLowerCase() !== inv.email.toLowerCase();
  return (
    <>
      {other ? (
        <Txt color={colors.warning} testID="invite-other-account">
          You are signed in as {email}, but the invitation was sent to {inv.email}. Sign out first to join with that address.
        </Txt>
      ) : null}
      <ErrorText boxed message={accept.error ? errorMessage(accept.error) : null} testID="invite-error" />
      <Button label={`Join ${inv.clubName}`} icon="people" testID="invite-accept" busy={accept.isPending} onPress={() => accept.mutate({ token })} />
    </>
  );
}

function JoinWithSignUp({ token, inv, accept }: { token: string; inv: InvitationPreview; accept: Accept }) {
  const { control, handleSubmit } = useForm({ resolver: zodResolver(joinSchema), mode: 'onChange', defaultValues: { displayName: '', callSign: '', password: '' } });
  const server = fieldErrors(accept.error);
  const submit = handleSubmit((signUp) => accept.mutate({ token, signUp }));
  return (
    <>
      <Txt color={colors.inkMuted}>Create your Loftline account for {inv.email} and join in one step.</Txt>
      <FormTextField control={control} name="displayName" label="Your name" testID="invite-name" autoComplete="name" serverError={server.displayName} />
      <FormTextField control={control} name="callSign" label="Call sign (optional)" testID="invite-call-sign" autoCapitalize="characters" mono serverError={server.callSign} />
      <FormTextField control={control} name="password" label="Password" testID="invite-password" secureTextEntry autoComplete="new-password" hint="At least 10 characters." serverError={server.password} />
      <ErrorText boxed message={accept.error ? errorMessage(accept.error) : null} testID="invite-error" />
      <Button label={`Create account and join`} icon="people" testID="invite-sign-up-accept" busy={accept.isPending} onPress={submit} />
      <AuthLink href={`/sign-in?next=${encodeURIComponent(`/invite/${token}`)}`} label="I already have an account: sign in" testID="invite-sign-in" />
    </>
  );
}

function SignInFirst({ token, inv }: { token: string; inv: InvitationPreview }) {
  const router = useRouter();
  return (
    <>
      <Txt color={colors.inkMuted}>{inv.email} already has a Loftline account. Sign in with it, then join.</Txt>
      <Button label="Sign in to join" testID="invite-sign-in-first" onPress={() => router.navigate(`/sign-in?next=${encodeURIComponent(`/invite/${token}`)}`)} />
    </>
  );
}

const styles = StyleSheet.create({
  summary: { flexDirection: 'row', gap: spacing.m, padding: spacing.l, backgroundColor: colors.infoSoft, borderRadius: radii.m, borderWidth: 1.5, borderColor: colors.action, marginBottom: spacing.m },
  summaryText: { flex: 1, gap: spacing.xs },
});
