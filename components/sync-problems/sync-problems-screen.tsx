import { useEffect, useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { EmptyState, ErrorText, Screen, Txt } from '@/components/ui';
import { colors, spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api/client';
import { useMembers } from '@/hooks/api/use-members';
import { CONFLICT_READERS, useMyRefusedChanges, useOpenConflicts } from '@/hooks/api/use-sync-problems';
import { useBreakpoint } from '@/hooks/use-breakpoint';
import { useCurrentClub } from '@/hooks/use-current-club';
import { can } from '@/shared/schemas';
import { ConflictCard } from './conflict-card';
import { RefusedChangeCard } from './refused-change-card';

/** Who sees the club's safety conflicts: the people who plan and the people who check. */

/*
 * "Changes to check": the club's safety-relevant values recorded twice at once (leads and admins settle them,
 * safety officers read them), and the person's own changes the server refused. Both lists come from the server,
 * so this screen needs the network; the sync indicator links here.
 */
export function SyncProblemsScreen() {
  const { club, role } = useCurrentClub();
  const { isWide } = useBreakpoint();
  const clubId = club?.id;
  const seesConflicts = role !== null && CONFLICT_READERS.includes(role);
  const conflicts = useOpenConflicts(clubId, seesConflicts);
  const refused = useMyRefusedChanges(clubId);
  const members = useMembers(seesConflicts ? clubId : undefined);
  const [nowMs, setNowMs] = useState(() => Date.now());
  useEffect(() => {
    const t = setInterval(() => setNowMs(Date.now()), 60_000);
    return () => clearInterval(t);
  }, []);
  const names = useMemo(() => new Map((members.data ?? []).map((m) => [m.userId, m.callSign ? `${m.displayName} ${m.callSign}` : m.displayName])), [members.data]);
  // Until the member list is in (or when it cannot be had offline), nobody is called a former member.
  const nameOf = (id: string | null) => (id ? (names.get(id) ?? (members.data ? 'a former member' : 'a club member')) : 'someone unknown');
  if (!clubId || !role) return null;

  const conflictList = seesConflicts ? (
    <View style={styles.section} testID="sync-problems-conflicts">
      <Txt variant="title" accessibilityRole="header">
        Values recorded twice
      </Txt>
      <Txt color={colors.inkMuted}>
        Two people changed the same height, position, power line or ground at the same time. Sync kept the later one and set the other aside here.
      </Txt>
      <ErrorText message={conflicts.error ? errorMessage(conflicts.error) : null} testID="sync-problems-conflicts-error" boxed />
      {conflicts.data?.length === 0 ? (
        <EmptyState icon="check-circle" title="Nothing recorded twice" body="No open disagreements between scouts’ values in this club." testID="sync-problems-conflicts-empty" />
      ) : null}
      {conflicts.data?.map((c) => (
        <ConflictCard key={c.id} conflict={c} clubId={clubId} nameOf={nameOf} canResolve={can(role, 'plan.write')} nowMs={nowMs} />
      ))}
    </View>
  ) : null;

  const refusedList = (
    <View style={styles.section} testID="sync-problems-refused">
      <Txt variant="title" accessibilityRole="header">
        Your changes the server refused
      </Txt>
      <ErrorText message={refused.error ? errorMessage(refused.error) : null} testID="sync-problems-refused-error" boxed />
      {refused.data?.length === 0 ? (
        <EmptyState icon="cloud-check" title="No refused changes" body="Everything you changed was accepted." testID="sync-problems-refused-empty" />
      ) : null}
      {refused.data?.map((r) => <RefusedChangeCard key={r.id} entry={r} clubId={clubId} nowMs={nowMs} />)}
    </View>
  );

  return (
    <Screen title="Changes to check" subtitle={club.name} testID="sync-problems">
      {isWide && conflictList ? (
        <View style={styles.columns}>
          <View style={styles.column}>{conflictList}</View>
          <View style={styles.column}>{refusedList}</View>
        </View>
      ) : (
        <View style={styles.stack}>
          {conflictList}
          {refusedList}
        </View>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  columns: { flexDirection: 'row', gap: spacing.xl, alignItems: 'flex-start' },
  column: { flex: 1, minWidth: 0 },
  stack: { gap: spacing.xl },
  section: { gap: spacing.m },
});
