import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Card, ErrorText, Icon, TextField, Txt } from '@/components/ui';
import { colors, radii, spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api/client';
import { useResolveConflict } from '@/hooks/api/use-sync-problems';
import { useMutate, useRecord } from '@/hooks/sync';
import { useUnits } from '@/hooks/use-units';
import { RecordWriteError, decodeHlc, type ConflictEntry } from '@/sync';
import { CONFLICT_CAUTION, LINE_CAUTION, conflictSentence, fieldWords, isHeightOrLineConflict, recordWords, valueWords } from './problem-text';

type Props = {
  conflict: ConflictEntry;
  clubId: string;
  nameOf: (userId: string | null) => string;
  /** Leads and admins settle; the safety officer reads. */
  canResolve: boolean;
  nowMs: number;
};

/** One value recorded twice at once: both values, who and when, the cautions, and (for a lead) the two ways out. */
export function ConflictCard({ conflict: c, clubId, nameOf, canResolve, nowMs }: Props) {
  // The record as this device holds it now (null: not on this device; deleted ones still name themselves).
  const record = (useRecord(c.collection, c.recordId, { includeDeleted: true }) ?? null) as Record<string, unknown> | null;
  const { formatLengthM } = useUnits();
  const mutate = useMutate();
  const resolve = useResolveConflict(clubId);
  const [note, setNote] = useState('');
  const [busy, setBusy] = useState<'kept' | 'other' | null>(null);
  const [error, setError] = useState<string | null>(null);
  const label = recordWords(c.collection, record);
  const sentence = conflictSentence({
    record: label,
    collection: c.collection,
    field: c.field,
    kept: { value: c.keptValue, who: nameOf(c.keptBy), wallMs: decodeHlc(c.keptClock).wallMs },
    other: { value: c.otherValue, who: nameOf(c.otherBy), wallMs: decodeHlc(c.otherClock).wallMs },
    nowMs,
    formatLengthM,
  });
  const current = record ? record[c.field] : undefined;
  const movedOn = record !== null && JSON.stringify(current ?? null) !== JSON.stringify(c.keptValue ?? null);
  const testID = `conflict-${c.id}`;

  const settle = async (choice: 'kept' | 'other') => {
    setBusy(choice);
    setError(null);
    try {
      // The other value goes through sync as an ordinary change, so the spots it touches go back to review.
      if (choice === 'other') await mutate.update(c.collection, c.recordId, { [c.field]: c.otherValue });
      await resolve.mutateAsync({ conflictId: c.id, body: { choice, ...(note.trim() ? { note: note.trim() } : {}) } });
    } catch (err) {
      setError(
        err instanceof RecordWriteError && err.code === 'not-found'
          ? `This ${fieldWords(c.collection, c.field)} cannot be changed from this device: the record is not here yet. Wait for sync and try again.`
          : errorMessage(err),
      );
    } finally {
      setBusy(null);
    }
  };

  return (
    <Card testID={testID} style={styles.card}>
      <View style={styles.head}>
        <Icon name="triangle-alert" size={22} color={colors.warning} />
        <Txt variant="bodyStrong" style={styles.flex} testID={`${testID}-text`}>
          {sentence}
        </Txt>
      </View>
      {movedOn ? (
        <Txt variant="caption" testID={`${testID}-now`}>
          Since then this device holds {valueWords(c.field, current, formatLengthM)}.
        </Txt>
      ) : null}
      <View style={styles.caution} accessibilityRole="summary" testID={`${testID}-caution`}>
        <Txt variant="caption" color={colors.warning}>
          {CONFLICT_CAUTION}
        </Txt>
        {isHeightOrLineConflict(c.collection, c.field) ? (
          <Txt variant="caption" color={colors.warning}>
            {LINE_CAUTION}
          </Txt>
        ) : null}
      </View>
      {canResolve ? (
        <View style={styles.actions}>
          <TextField label="Why (optional, kept with the decision)" testID={`${testID}-note`} value={note} onChangeText={setNote} maxLength={500} />
          <View style={styles.buttons}>
            <Button
              label={`Keep ${valueWords(c.field, c.keptValue, formatLengthM)}`}
              accessibilityLabel={`Keep the value the merge kept: ${valueWords(c.field, c.keptValue, formatLengthM)}`}
              variant="secondary"
              testID={`${testID}-keep`}
              busy={busy === 'kept'}
              disabled={busy !== null}
              onPress={() => void settle('kept')}
            />
            <Button
              label={`Use ${valueWords(c.field, c.otherValue, formatLengthM)}`}
              accessibilityLabel={`Use the other value instead: ${valueWords(c.field, c.otherValue, formatLengthM)}`}
              testID={`${testID}-use-other`}
              busy={busy === 'other'}
              disabled={busy !== null}
              onPress={() => void settle('other')}
            />
          </View>
        </View>
      ) : (
        <Txt variant="caption" color={colors.inkMuted}>
          A lead or club admin settles this once the value has been checked on site.
        </Txt>
      )}
      <ErrorText message={error} testID={`${testID}-error`} />
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.s },
  head: { flexDirection: 'row', gap: spacing.s, alignItems: 'flex-start' },
  flex: { flex: 1 },
  caution: { borderWidth: 1.5, borderColor: colors.warning, backgroundColor: colors.warningSoft, borderRadius: radii.m, padding: spacing.s, gap: spacing.xs },
  actions: { gap: spacing.s },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.s },
});
