import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, ErrorText, TextField, Txt } from '@/components/ui';
import { colors, spacing } from '@/constants/theme';
import type { ResultReview } from '@/shared/review';
import { ClearanceBadge } from '@/components/plan/spot-state-badge';
import { withLabels } from '@/components/plan/label-ids';

export const CONFIRM_CLEAR_REASON = 'Clear of what Loftline checked; confirmed against the site notes.';

type Props = {
  result: ResultReview;
  canDecide: boolean;
  decidedByName: (id: string) => string;
  labels: ReadonlyMap<string, string>;
  onDecide: (resultKey: string, decision: 'accept' | 'send-back', reason: string) => string | null;
  testID: string;
};

/** One clearance result under review: what was found, the rule and source, the decision in force and the controls. */
export function DecisionRow({ result: r, canDecide, decidedByName, labels, onDecide, testID }: Props) {
  const [reason, setReason] = useState(r.needs === 'confirm' ? CONFIRM_CLEAR_REASON : '');
  const [problem, setProblem] = useState<string | null>(null);
  // Once a result is accepted only "send back" is left, and its reason box opens on demand.
  const [reopened, setReopened] = useState(false);
  const decided = r.needs === 'nothing' && !reopened;
  const decide = (d: 'accept' | 'send-back') => {
    const p = onDecide(r.key, d, reason);
    setProblem(p);
    if (!p) {
      setReason(r.needs === 'confirm' ? CONFIRM_CLEAR_REASON : '');
      setReopened(false);
    }
  };
  return (
    <View style={styles.row} testID={testID}>
      <ClearanceBadge level={r.level} />
      <Txt>{withLabels(r.message, labels)}</Txt>
      {r.rule ? <Txt variant="caption" color={colors.inkMuted}>Rule: {r.rule}</Txt> : null}
      {r.source ? <Txt variant="caption" color={colors.inkMuted}>Source: {r.source}</Txt> : null}
      {r.decision ? (
        <Txt variant="caption" testID={`${testID}-decision`} color={r.decision.decision === 'accept' ? colors.ok : colors.danger}>
          {r.decision.decision === 'accept' ? 'Accepted' : 'Sent back'} by {decidedByName(r.decision.decidedBy)} on {r.decision.decidedAt.slice(0, 16).replace('T', ' ')} UTC: “{r.decision.reason}”
        </Txt>
      ) : null}
      {r.needs === 'move-spot' ? (
        <Txt variant="caption" color={colors.danger} testID={`${testID}-blocked`}>Blocked results cannot be accepted by anyone: the lead must move this antenna.</Txt>
      ) : null}
      {canDecide ? (
        <View style={styles.controls}>
          {decided ? (
            <Button label="Send back to the lead…" icon="return" variant="quiet" compact testID={`${testID}-reopen`} onPress={() => setReopened(true)} />
          ) : (
            <TextField
              label={r.needs === 'accept-with-reason' ? 'Why this is acceptable, or why it goes back' : 'Reason'}
              testID={`${testID}-reason`}
              value={reason}
              onChangeText={setReason}
              multiline
            />
          )}
          {decided ? null : <View style={styles.buttons}>
            {r.needs === 'accept-with-reason' || r.needs === 'confirm' ? (
              <Button label={r.needs === 'confirm' ? 'Confirm' : 'Accept'} icon="check-circle" testID={`${testID}-accept`} onPress={() => decide('accept')} />
            ) : null}
            <Button label="Send back to the lead" icon="return" variant="danger" testID={`${testID}-send-back`} onPress={() => decide('send-back')} />
          </View>}
          {problem ? <ErrorText message={problem} testID={`${testID}-problem`} /> : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: spacing.xs, paddingVertical: spacing.m, borderBottomWidth: 1, borderBottomColor: colors.lineSoft },
  controls: { gap: spacing.s, marginTop: spacing.s },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.s },
});
