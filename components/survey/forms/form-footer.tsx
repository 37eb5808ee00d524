import { StyleSheet, View } from 'react-native';
import { Button, ErrorText, Txt } from '@/components/ui';
import { colors, radii, spacing } from '@/constants/theme';

/** Questions (save anyway) and the form's errors, then Save / Cancel, the same on every survey form. */
export function FormFooter({ testID, questions, blockers = [], saveError, canSave, busy, onSave, onCancel, saveLabel = 'Save' }: {
  testID: string; questions: string[];
  /** Why Save is not offered yet, in plain words (the form's current errors). */
  blockers?: string[]; saveError?: string | null; canSave: boolean; busy?: boolean; onSave: () => void; onCancel: () => void; saveLabel?: string;
}) {
  return (
    <View style={styles.wrap}>
      {questions.length > 0 ? (
        <View style={styles.questions} testID={`${testID}-questions`}>
          {questions.map((q) => <Txt key={q} color={colors.warning} variant="bodyStrong">⚠ {q}</Txt>)}
        </View>
      ) : null}
      {!canSave && !busy && blockers.length > 0 ? (
        <View style={styles.blockers} testID={`${testID}-blockers`}>
          <Txt variant="label">Before saving:</Txt>
          {[...new Set(blockers)].map((b) => <Txt key={b} variant="caption">• {b.charAt(0).toUpperCase() + b.slice(1)}</Txt>)}
        </View>
      ) : null}
      <ErrorText message={saveError} testID={`${testID}-save-error`} boxed />
      <View style={styles.row}>
        <Button label={saveLabel} testID={`${testID}-save`} icon="check-circle" disabled={!canSave} busy={busy} onPress={onSave} style={styles.grow} />
        <Button label="Cancel" testID={`${testID}-cancel`} variant="secondary" onPress={onCancel} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.m, marginTop: spacing.s },
  questions: { backgroundColor: colors.warningSoft, borderRadius: radii.m, padding: spacing.m, gap: spacing.xs, borderWidth: 1.5, borderColor: colors.warning },
  row: { flexDirection: 'row', gap: spacing.s },
  blockers: { gap: spacing.xxs, padding: spacing.m, borderRadius: radii.m, backgroundColor: colors.surfaceSunk },
  grow: { flex: 1 },
});
