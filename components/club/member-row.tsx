import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '@/constants/theme';
import { Badge, Button, ErrorText, Select, Txt } from '@/components/ui';
import { errorMessage } from '@/hooks/api/client';
import { useChangeMemberRole, useRemoveMember } from '@/hooks/api/use-members';
import { ROLE_LABELS, type Member, type Role } from '@/shared/schemas';
import { ROLE_OPTIONS } from './invite-form';
import { roleLook } from './role-look';

type Props = { clubId: string; member: Member; canManage: boolean; isSelf: boolean };

export function MemberRow({ clubId, member, canManage, isSelf }: Props) {
  const [editing, setEditing] = useState(false);
  const [confirmRemove, setConfirmRemove] = useState(false);
  const changeRole = useChangeMemberRole(clubId);
  const remove = useRemoveMember(clubId);
  const error = changeRole.error ?? remove.error;
  const id = member.userId;
  return (
    <View style={styles.row} testID={`member-${member.email}`} accessibilityLabel={`${member.displayName}, ${ROLE_LABELS[member.role]}`}>
      <View style={styles.head}>
        <View style={styles.who}>
          <Txt variant="bodyStrong">
            {member.displayName}
            {isSelf ? ' (you)' : ''}
          </Txt>
          <Txt variant="caption" color={colors.inkMuted}>
            {member.callSign ? `${member.callSign} · ` : ''}
            {member.email}
          </Txt>
        </View>
        <Badge look={roleLook(member.role)} testID={`member-role-${member.email}`} />
      </View>
      {canManage ? (
        <View style={styles.actions}>
          <Button label={editing ? 'Done' : 'Change role'} variant="secondary" compact testID={`member-edit-${id}`} accessibilityLabel={`Change the role of ${member.displayName}`} onPress={() => setEditing(!editing)} />
          {confirmRemove ? (
            <>
              <Button label={`Remove ${member.displayName}`} variant="danger" icon="trash" compact testID={`member-remove-confirm-${id}`} busy={remove.isPending} onPress={() => remove.mutate(id, { onSettled: () => setConfirmRemove(false) })} />
              <Button label="Keep" variant="quiet" compact testID={`member-remove-cancel-${id}`} onPress={() => setConfirmRemove(false)} />
            </>
          ) : (
            <Button label="Remove" variant="danger" compact testID={`member-remove-${id}`} accessibilityLabel={`Remove ${member.displayName} from the club`} onPress={() => setConfirmRemove(true)} />
          )}
        </View>
      ) : null}
      {canManage && editing ? (
        <Select<Role>
          label={`Role of ${member.displayName}`}
          testID={`member-role-select-${id}`}
          options={ROLE_OPTIONS}
          value={changeRole.isPending ? changeRole.variables.role : member.role}
          disabled={changeRole.isPending}
          onChange={(role) => changeRole.mutate({ userId: id, role })}
        />
      ) : null}
      <ErrorText message={error ? errorMessage(error) : null} testID={`member-error-${id}`} />
    </View>
  );
}

const styles = StyleSheet.create({
  row: { paddingVertical: spacing.m, borderBottomWidth: 1.5, borderBottomColor: colors.lineSoft, gap: spacing.s },
  head: { flexDirection: 'row', alignItems: 'center', gap: spacing.m },
  who: { flex: 1, gap: 2 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.s },
});
