import { ScrollView, StyleSheet, View } from 'react-native';
import { colors, spacing } from '@/constants/theme';
import { useBreakpoint } from '@/hooks/use-breakpoint';

type Props = {
  list: React.ReactNode;
  detail: React.ReactNode | null;
  /** What the detail pane shows when nothing is chosen (wide screens only). */
  placeholder?: React.ReactNode;
  listWidthPx?: number;
  testID?: string;
};

/**
 * List beside detail on wide screens. On a phone only one shows: the detail when one is chosen,
 * otherwise the list (the route decides which is chosen, so back and reload behave).
 */
export function TwoPane({ list, detail, placeholder, listWidthPx = 400, testID }: Props) {
  const { isWide } = useBreakpoint();
  if (!isWide) return <View style={styles.fill}>{detail ?? list}</View>;
  return (
    <View style={[styles.fill, styles.row]} testID={testID}>
      <ScrollView style={[styles.list, { width: listWidthPx }]} contentContainerStyle={styles.listContent}>
        {list}
      </ScrollView>
      <View style={styles.detail}>{detail ?? placeholder ?? null}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1 },
  row: { flexDirection: 'row' },
  list: { flexGrow: 0, flexShrink: 0, borderRightWidth: 1.5, borderRightColor: colors.lineSoft, backgroundColor: colors.paper },
  listContent: { padding: spacing.l },
  detail: { flex: 1 },
});
