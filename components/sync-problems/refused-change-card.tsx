import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Card, ErrorText, Icon, Txt } from '@/components/ui';
import { colors, spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api/client';
import { useDismissRefusedChange } from '@/hooks/api/use-sync-problems';
import { useRecord, useSyncContext } from '@/hooks/sync';
import { useUnits } from '@/hooks/use-units';
import type { RejectedEntry } from '@/sync';
import { clockWords, recordWords, refusedWords, sentenceCase } from './problem-text';

const WHY: Record<RejectedEntry['code'], string> = {
  forbidden: 'Your role does not allow this',
  invalid: 'The values were not accepted',
  'not-found': 'The record is gone',
  'append-only': 'This record cannot be changed once made',
  'bad-clock': 'The change came from another device’s clock',
};

type Props = { entry: RejectedEntry; clubId: string; nowMs: number };

/** One of the person's own changes the server refused: what, why, when, and "dismiss" once read. */
export function RefusedChangeCard({ entry: r, clubId, nowMs }: Props) {
  const record = (useRecord(r.collection, r.recordId, { includeDeleted: true }) ?? null) as Record<string, unknown> | null;
  const { formatLengthM } = useUnits();
  const { client } = useSyncContext();
  // A refusal of this device's own change is also kept on the device (the indicator warns of it): forget it too.
  const dismiss = useDismissRefusedChange(clubId, async (e) => {
    if (client && e.deviceId === client.deviceId) await client.dismissRejection(e.mutationId);
  });
  const [error, setError] = useState<string | null>(null);
  const what = refusedWords({ collection: r.collection, op: r.op, record: recordWords(r.collection, record, r.fields), fields: r.fields, formatLengthM });
  const testID = `refused-${r.id}`;
  return (
    <Card testID={testID} style={styles.card}>
      <View style={styles.head}>
        <Icon name="octagon-x" size={22} color={colors.danger} />
        <View style={styles.flex}>
          <Txt variant="bodyStrong">{WHY[r.code]}</Txt>
          <Txt testID={`${testID}-reason`}>{sentenceCase(r.message)}</Txt>
        </View>
      </View>
      <Txt variant="caption" testID={`${testID}-what`}>
        Refused {clockWords(Date.parse(r.createdAt), nowMs)}: {what}
      </Txt>
      <Txt variant="caption" color={colors.inkMuted}>
        Nothing of this change was stored on the server. If it is still needed, make it again (or ask someone whose role allows it).
      </Txt>
      <View style={styles.buttons}>
        <Button
          label="Dismiss"
          icon="close"
          variant="secondary"
          compact
          accessibilityLabel={`Dismiss the refused ${what}`}
          testID={`${testID}-dismiss`}
          busy={dismiss.isPending}
          onPress={() => {
            setError(null);
            dismiss.mutate(r, { onError: (err) => setError(errorMessage(err)) });
          }}
        />
      </View>
      <ErrorText message={error} testID={`${testID}-error`} />
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.s },
  head: { flexDirection: 'row', gap: spacing.s, alignItems: 'flex-start' },
  flex: { flex: 1, gap: spacing.xxs },
  buttons: { flexDirection: 'row', justifyContent: 'flex-end' },
});
