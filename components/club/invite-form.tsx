import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '@/constants/theme';
import { Button, Card, ErrorText, FormSelect, FormTextField, Icon, Txt } from '@/components/ui';
import { errorMessage, fieldErrors } from '@/hooks/api/client';
import { useCreateInvitation } from '@/hooks/api/use-invitations';
import { inviteCreateSchema, ROLE_LABELS, ROLES } from '@/shared/schemas';

export const ROLE_OPTIONS = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));

/** Admin: invite someone by e-mail with a role; the link goes out through the mail queue. */
export function InviteForm({ clubId }: { clubId: string }) {
  const invite = useCreateInvitation(clubId);
  const { control, handleSubmit, reset } = useForm({ resolver: zodResolver(inviteCreateSchema), mode: 'onChange', defaultValues: { email: '', role: 'scout' as const } });
  const server = fieldErrors(invite.error);
  const submit = handleSubmit((v) => invite.mutate(v, { onSuccess: () => reset({ email: '', role: v.role }) }));
  return (
    <Card title="Invite a member" testID="invite-card">
      <FormTextField control={control} name="email" label="Their e-mail" testID="invite-email" inputMode="email" autoCapitalize="none" autoComplete="off" serverError={server.email} />
      <FormSelect control={control} name="role" label="Role in this club" testID="invite-role" options={ROLE_OPTIONS} serverError={server.role} />
      <ErrorText boxed message={invite.error ? errorMessage(invite.error) : null} testID="invite-create-error" />
      {invite.isSuccess ? (
        <View style={styles.sent} testID="invite-sent" accessibilityRole="alert">
          <Icon name="mail" size={20} color={colors.ok} />
          <Txt color={colors.ok} variant="bodyStrong" style={styles.flex}>
            Invitation sent to {invite.data.email}.
          </Txt>
        </View>
      ) : null}
      <Button label="Send the invitation" icon="mail" testID="invite-submit" busy={invite.isPending} onPress={submit} />
    </Card>
  );
}

const styles = StyleSheet.create({
  sent: { flexDirection: 'row', alignItems: 'center', gap: spacing.s, marginBottom: spacing.m },
  flex: { flex: 1 },
});
