import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '@/constants/theme';
import { Button, Card, ErrorText, Screen, Tabular, Txt } from '@/components/ui';
import { errorMessage } from '@/hooks/api/client';
import { useInvitations, useRevokeInvitation } from '@/hooks/api/use-invitations';
import { useMembers } from '@/hooks/api/use-members';
import { useSession } from '@/hooks/auth/use-session';
import { useBreakpoint } from '@/hooks/use-breakpoint';
import { useCurrentClub } from '@/hooks/use-current-club';
import { can, ROLE_LABELS } from '@/shared/schemas';
import { InviteForm } from './invite-form';
import { MemberRow } from './member-row';

/** The club: who is in it with which role; an admin also invites, changes roles and removes. */
export function MembersScreen() {
  const { club, role } = useCurrentClub();
  const { user } = useSession();
  const router = useRouter();
  const { isWide } = useBreakpoint();
  const members = useMembers(club?.id);
  const canManage = !!role && can(role, 'club.manage');
  if (!club) return null;
  const list = (
    <Card title={`Members (${members.data?.length ?? '…'})`} testID="members-card">
      <ErrorText boxed message={members.error ? errorMessage(members.error) : null} testID="members-error" />
      {members.data?.map((m) => <MemberRow key={m.userId} clubId={club.id} member={m} canManage={canManage} isSelf={m.userId === user?.id} />)}
      {!canManage ? (
        <Txt variant="caption" color={colors.inkMuted} style={styles.note}>
          Only the club's admins invite people and change roles.
        </Txt>
      ) : null}
    </Card>
  );
  const side = canManage ? (
    <>
      <InviteForm clubId={club.id} />
      <PendingInvitations clubId={club.id} />
    </>
  ) : null;
  return (
    <Screen
      title={club.name}
      subtitle={`${club.callSign ? `${club.callSign} · ` : ''}You are ${ROLE_LABELS[club.role]}`}
      actions={<Button label="Start another club" icon="plus" variant="secondary" testID="members-new-club" onPress={() => router.navigate('/club/new')} />}
      testID="members"
    >
      {isWide ? (
        <View style={styles.columns}>
          <View style={styles.main}>{list}</View>
          {side ? <View style={styles.side}>{side}</View> : null}
        </View>
      ) : (
        <>
          {side}
          {list}
        </>
      )}
    </Screen>
  );
}

function PendingInvitations({ clubId }: { clubId: string }) {
  const invitations = useInvitations(clubId);
  const revoke = useRevokeInvitation(clubId);
  const pending = (invitations.data ?? []).filter((i) => !i.acceptedAt);
  return (
    <Card title="Waiting to accept" testID="pending-invitations">
      <ErrorText message={invitations.error ? errorMessage(invitations.error) : revoke.error ? errorMessage(revoke.error) : null} testID="pending-error" />
      {pending.length === 0 ? <Txt color={colors.inkMuted}>No invitation is waiting.</Txt> : null}
      {pending.map((i) => (
        <View key={i.id} style={styles.invite} testID={`pending-${i.email}`}>
          <View style={styles.main}>
            <Txt variant="bodyStrong">{i.email}</Txt>
            <Txt variant="caption" color={colors.inkMuted}>
              {ROLE_LABELS[i.role]} · until <Tabular size={14}>{i.expiresAt.slice(0, 10)}</Tabular>
            </Txt>
          </View>
          <Button label="Revoke" variant="danger" compact testID={`revoke-${i.id}`} accessibilityLabel={`Revoke the invitation to ${i.email}`} busy={revoke.isPending && revoke.variables === i.id} onPress={() => revoke.mutate(i.id)} />
        </View>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  columns: { flexDirection: 'row', gap: spacing.xl, alignItems: 'flex-start' },
  main: { flex: 1 },
  side: { width: 400 },
  note: { marginTop: spacing.m },
  invite: { flexDirection: 'row', alignItems: 'center', gap: spacing.m, paddingVertical: spacing.s, borderBottomWidth: 1, borderBottomColor: colors.lineSoft },
});
