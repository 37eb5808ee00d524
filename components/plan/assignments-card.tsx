import { StyleSheet, View } from 'react-native';
import { Button, Card, Txt } from '@/components/ui';
import { colors, spacing } from '@/constants/theme';
import type { PlanState } from '@/hooks/plan/use-plan-result';
import type { SeparationResult } from '@/shared/plan';
import type { AntennaSpot, Station } from '@/shared/schemas';
import type { SpotEvaluation } from '@/shared/review';
import { ClearanceBadge, SpotStateBadge } from './spot-state-badge';
import { withLabels } from './label-ids';
import { spotLegsText } from './leg-text';

type Props = {
  spots: SpotEvaluation[];
  stations: Station[];
  separations: SeparationResult[];
  plan: PlanState;
  canPlan: boolean;
  onAssignAll: () => void;
  onSendForReview: (spot: AntennaSpot, fingerprint: string) => void;
  onOpen: (s: SpotEvaluation) => void;
  onRemove: (spot: AntennaSpot) => void;
  assignMessage: string | null;
  labels: ReadonlyMap<string, string>;
};

/** The spots chosen for the event, their review state, and the separation between them. */
export function AssignmentsCard({ spots, stations, separations, plan, canPlan, onAssignAll, onSendForReview, onOpen, onRemove, assignMessage, labels }: Props) {
  const stationName = (id: string) => stations.find((s) => s.id === id)?.name ?? 'A removed station';
  const explanation = plan.status === 'done' ? plan.result.assignment.spots : [];
  const warnings = separations.filter((s) => s.level !== 'clear');
  return (
    <Card
      title="Assignments"
      testID="plan-assignments"
      right={
        canPlan ? (
          <Button label="Assign all stations" testID="plan-assign-all" onPress={onAssignAll} disabled={plan.status !== 'done'} busy={plan.status === 'computing'} />
        ) : null
      }
    >
      {assignMessage ? <Txt testID="plan-assign-message" color={colors.ok}>{assignMessage}</Txt> : null}
      {spots.length === 0 ? <Txt color={colors.inkMuted}>No spots chosen yet. Use “Assign all stations”, or open a candidate below and assign it.</Txt> : null}
      {spots.map((s) => {
        // Sent once per placement: a spot sent back must move (which makes it planned again) before it goes back.
        const canSend = canPlan && s.spot.state === 'planned' && s.evaluated !== null;
        return (
          <View key={s.spot.id} style={styles.spot} testID={`assignment-${s.spot.stationId}-${s.spot.band}`}>
            <View style={styles.line}>
              <Txt variant="bodyStrong">{stationName(s.spot.stationId)} · {s.spot.band}</Txt>
              <SpotStateBadge state={s.review.state} testID={`assignment-state-${s.spot.id}`} />
              {s.evaluated ? <ClearanceBadge level={s.evaluated.candidate.level} /> : null}
            </View>
            <Txt testID={`assignment-where-${s.spot.id}`}>{s.spot.shape === 'flat' ? `Flat-top between ${s.supportLabels.join(' and ')}` : `Inverted-V from ${s.supportLabels[0]}${spotLegsText(s)}`}</Txt>
            {s.review.reasons.map((r) => <Txt key={r} variant="caption" color={colors.danger}>{r}</Txt>)}
            <View style={styles.line}>
              <Button label="Open" variant="secondary" compact testID={`assignment-open-${s.spot.id}`} onPress={() => onOpen(s)} />
              {canSend ? <Button label="Send for review" compact icon="shield" testID={`assignment-send-${s.spot.id}`} onPress={() => onSendForReview(s.spot, s.fingerprint)} /> : null}
              {canPlan ? <Button label="Remove" variant="quiet" compact testID={`assignment-remove-${s.spot.id}`} onPress={() => onRemove(s.spot)} /> : null}
            </View>
          </View>
        );
      })}
      {warnings.length > 0 ? (
        <View style={styles.block} testID="plan-separation-warnings">
          <Txt variant="label" color={colors.warning}>Separation between chosen spots</Txt>
          {warnings.map((w) => (
            <View key={w.key} style={styles.line}>
              <ClearanceBadge level={w.level} />
              <Txt variant="caption" style={styles.flex}>{withLabels(w.message, labels)}</Txt>
            </View>
          ))}
        </View>
      ) : spots.length > 1 ? <Txt variant="caption" color={colors.inkMuted} testID="plan-separation-ok">The chosen spots keep at least 1 λ from each other on related bands.</Txt> : null}
      {explanation.length > 0 ? (
        <View style={styles.block} testID="plan-assign-explanation">
          <Txt variant="label">How “assign all stations” chose</Txt>
          <Txt variant="caption">{plan.status === 'done' ? `${plan.result.assignment.exact ? 'Exact search' : 'Best found by a heuristic search'} over every station’s usable spots, for the highest total score without sharing a support beyond its ends or crowding each other.` : ''}</Txt>
          {explanation.map((e) => (
            <Txt key={e.needKey} variant="caption">• {stationName(e.stationId)} {e.band}: {withLabels([...e.limitedBy, e.coaxNote].filter(Boolean).join('; '), labels)}</Txt>
          ))}
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  spot: { gap: spacing.xs, paddingVertical: spacing.s, borderBottomWidth: 1, borderBottomColor: colors.lineSoft },
  line: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.s },
  block: { marginTop: spacing.m, gap: spacing.xs },
  flex: { flex: 1 },
});
