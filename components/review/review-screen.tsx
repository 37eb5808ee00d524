import { useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { Button, Card, ErrorText, Screen, Txt } from '@/components/ui';
import { CautionsBox } from '@/components/plan/cautions-box';
import { SpotStateBadge } from '@/components/plan/spot-state-badge';
import { colors, spacing } from '@/constants/theme';
import { RoleNotice } from '@/components/plan/role-notice';
import { labelsOf } from '@/components/plan/label-ids';
import { spotLegsText } from '@/components/plan/leg-text';
import { useMembers } from '@/hooks/api/use-members';
import { useSession } from '@/hooks/auth/use-session';
import { useEventRecords } from '@/hooks/plan/use-event-records';
import { useSpotReviews } from '@/hooks/plan/use-spot-reviews';
import { useMutate, useSyncStatus } from '@/hooks/sync';
import { useCurrentClub } from '@/hooks/use-current-club';
import { decisionProblem, type SpotEvaluation } from '@/shared/review';
import { can, reviewDecisionFieldsSchema, type SpotState } from '@/shared/schemas';
import { CONFIRM_CLEAR_REASON, DecisionRow } from './decision-row';

const QUEUE_ORDER: Record<SpotState, number> = { 'waiting-review': 0, 'sent-back': 1, cleared: 2, up: 3, down: 4, planned: 5 };

/** The safety officer's queue: every spot of the event with its clearance results, decided one by one. */
export function ReviewScreen({ eventId }: { eventId: string }) {
  const { club, role } = useCurrentClub();
  const { user } = useSession();
  const members = useMembers(club?.id);
  const records = useEventRecords(eventId);
  const reviews = useSpotReviews(records);
  const mutate = useMutate();
  const sync = useSyncStatus();
  const [error, setError] = useState<string | null>(null);
  if (records === undefined) return <ActivityIndicator color={colors.action} size="large" style={styles.loading} testID="review-loading" />;
  if (records === null || !reviews) return <Screen title="Review"><ErrorText boxed message="This event or its site is not on this device yet. Connect once so it can sync." testID="review-missing" /></Screen>;
  if (role === 'crew') return <RoleNotice eventId={eventId} />;
  const mayDecide = !!role && can(role, 'review.decide') && !!user;
  // Until this device has finished its first sync it may hold only part of the survey (a pull comes in pages): a
  // decision made on part of the hazards would be refused by the server, so the buttons wait for the whole picture.
  const firstSyncDone = sync.lastSyncedAt !== null;
  const canDecide = mayDecide && firstSyncDone;
  const stationName = (id: string) => records.stations.find((s) => s.id === id)?.name ?? 'A removed station';
  const nameOf = (id: string) => members.data?.find((m) => m.userId === id)?.displayName ?? (id === user?.id ? 'you' : 'a safety officer');
  const labels = labelsOf(records.supports, records.hazards, records.operatingPositions, records.stations, records.coax);
  const queue = [...reviews.spots].sort((a, b) => QUEUE_ORDER[a.review.state] - QUEUE_ORDER[b.review.state]);
  const waiting = queue.filter((s) => s.review.state === 'waiting-review').length;

  const decide = (s: SpotEvaluation, resultKey: string, decision: 'accept' | 'send-back', reason: string): string | null => {
    const draft = { resultKey, decision, reason, inputsFingerprint: s.fingerprint };
    const problem = decisionProblem(draft, s.results, s.fingerprint);
    if (problem) return problem;
    const fields = reviewDecisionFieldsSchema.safeParse({ ...draft, spotId: s.spot.id, decidedAt: new Date().toISOString(), decidedBy: user!.id });
    if (!fields.success) return fields.error.issues[0]?.message ?? 'The decision is not valid.';
    mutate.create('reviewDecisions', fields.data).then(() => setError(null), (e: Error) => setError(e.message));
    return null;
  };
  const confirmAllClear = (s: SpotEvaluation) => {
    for (const r of s.review.results) if (r.needs === 'confirm') decide(s, r.key, 'accept', CONFIRM_CLEAR_REASON);
  };

  return (
    <Screen title="Review" subtitle={`${records.event.name} · ${waiting} spot${waiting === 1 ? '' : 's'} waiting`} testID="review-screen">
      {error ? <ErrorText boxed message={error} testID="review-error" /> : null}
      {!mayDecide ? <Txt testID="review-read-only" color={colors.inkMuted}>Only the safety officer decides reviews; you can see where each spot stands.</Txt> : null}
      {mayDecide && !firstSyncDone ? (
        <Txt testID="review-first-sync" color={colors.warning}>
          This device is still getting the club’s records. Decisions open once its first sync has finished, so that they are made on everything the scouts recorded.
        </Txt>
      ) : null}
      {queue.length === 0 ? <Txt testID="review-empty">No spots to review yet: the lead assigns spots and sends them for review.</Txt> : null}
      {queue.map((s) => {
        const confirmable = s.review.results.filter((r) => r.needs === 'confirm').length;
        return (
          <Card
            key={s.spot.id}
            testID={`review-spot-${s.spot.stationId}-${s.spot.band}`}
            title={`${stationName(s.spot.stationId)} · ${s.spot.band} · ${s.spot.shape === 'flat' ? s.supportLabels.join(' – ') : `inverted-V at ${s.supportLabels[0]}${spotLegsText(s)}`}`}
            right={<SpotStateBadge state={s.review.state} testID={`review-state-${s.spot.id}`} />}
          >
            {s.review.reasons.map((r) => <Txt key={r} color={colors.danger} testID={`review-reason-${s.spot.id}`}>{r}</Txt>)}
            {s.review.state === 'planned' ? <Txt color={colors.inkMuted}>Not sent for review yet.</Txt> : null}
            <Txt variant="caption" color={colors.inkMuted}>{s.review.pendingCount} to decide · {s.review.blockedCount} blocked{s.review.staleDecisionCount ? ` · ${s.review.staleDecisionCount} earlier decision(s) no longer apply after a change` : ''}</Txt>
            {canDecide && confirmable > 1 && s.review.state !== 'planned' ? (
              <Button label={`Confirm the ${confirmable} clear results`} variant="secondary" icon="check-circle" testID={`review-confirm-clear-${s.spot.id}`} onPress={() => confirmAllClear(s)} />
            ) : null}
            {s.review.state !== 'planned'
              ? s.review.results.map((r) => (
                  <DecisionRow key={r.key} result={r} canDecide={canDecide} decidedByName={nameOf} labels={labels} onDecide={(k, d, reason) => decide(s, k, d, reason)} testID={`review-result-${s.spot.id}-${r.key}`} />
                ))
              : null}
          </Card>
        );
      })}
      <CautionsBox testID="review-cautions" />
    </Screen>
  );
}

const styles = StyleSheet.create({ loading: { marginTop: spacing.xxxl } });
