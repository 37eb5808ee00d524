import { StyleSheet, View } from 'react-native';
import { Txt } from '@/components/ui';
import { colors, spacing } from '@/constants/theme';
import type { Clearance } from '@/shared/clearance/types';
import { ClearanceBadge } from './spot-state-badge';
import { withLabels } from './label-ids';

/** Every checked rule of a spot: level, the plain-words result, the rule and its source. */
export function ClearanceList({ clearances, labels, testID }: { clearances: readonly Clearance[]; labels: ReadonlyMap<string, string>; testID: string }) {
  const order = { blocked: 0, 'needs-review': 1, clear: 2 } as const;
  const sorted = [...clearances].sort((a, b) => order[a.level] - order[b.level] || (a.key < b.key ? -1 : 1));
  return (
    <View testID={testID} style={styles.list}>
      {sorted.map((c) => (
        <View key={c.key} style={styles.row} testID={`${testID}-${c.key}`}>
          <ClearanceBadge level={c.level} />
          <Txt>{withLabels(c.message, labels)}</Txt>
          <Txt variant="caption" color={colors.inkMuted}>Rule: {c.rule}</Txt>
          <Txt variant="caption" color={colors.inkMuted}>Source: {c.source}</Txt>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.m },
  row: { gap: spacing.xs, paddingBottom: spacing.s, borderBottomWidth: 1, borderBottomColor: colors.lineSoft },
});
