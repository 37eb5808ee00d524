import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radii, spacing, touchTargetPx } from '@/constants/theme';
import { Tabular } from './tabular';
import { Txt } from './text';

export type Column<Row> = {
  key: string;
  title: string;
  /** Relative width. */
  flex?: number;
  /** Figures: shown in the mono face and right-aligned. */
  numeric?: boolean;
  render: (row: Row) => React.ReactNode | string;
};

type Props<Row> = {
  columns: Column<Row>[];
  rows: Row[];
  rowKey: (row: Row) => string;
  onRowPress?: (row: Row) => void;
  rowLabel: (row: Row) => string;
  testID: string;
  selectedKey?: string;
};

/** The wide-screen list: a real table with a header, zebra rows and whole-row links. */
export function DataTable<Row>({ columns, rows, rowKey, onRowPress, rowLabel, testID, selectedKey }: Props<Row>) {
  return (
    <View style={styles.table} testID={testID} accessibilityRole="list">
      <View style={[styles.row, styles.header]}>
        {columns.map((c) => (
          <View key={c.key} style={[styles.cell, { flex: c.flex ?? 1 }]}>
            <Txt variant="label" color={colors.onShellBar} align={c.numeric ? 'right' : 'left'}>
              {c.title}
            </Txt>
          </View>
        ))}
      </View>
      {rows.map((row, i) => {
        const key = rowKey(row);
        const cells = columns.map((c) => {
          const v = c.render(row);
          return (
            <View key={c.key} style={[styles.cell, { flex: c.flex ?? 1 }]}>
              {typeof v === 'string' ? (
                c.numeric ? (
                  <Tabular style={styles.right}>{v}</Tabular>
                ) : (
                  <Txt>{v}</Txt>
                )
              ) : (
                v
              )}
            </View>
          );
        });
        const style = [styles.row, i % 2 === 1 && styles.zebra, key === selectedKey && styles.selected];
        return onRowPress ? (
          <Pressable
            key={key}
            testID={`${testID}-row-${key}`}
            accessibilityRole="link"
            accessibilityLabel={rowLabel(row)}
            onPress={() => onRowPress(row)}
            style={({ pressed }) => [...style, pressed && styles.pressed]}
          >
            {cells}
          </Pressable>
        ) : (
          <View key={key} style={style} testID={`${testID}-row-${key}`} accessibilityLabel={rowLabel(row)}>
            {cells}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { borderRadius: radii.l, overflow: 'hidden', borderWidth: 1.5, borderColor: colors.lineSoft, backgroundColor: colors.surface },
  row: { flexDirection: 'row', alignItems: 'center', minHeight: touchTargetPx + 8, paddingHorizontal: spacing.m },
  header: { backgroundColor: colors.shellBar, minHeight: touchTargetPx },
  cell: { paddingHorizontal: spacing.s, paddingVertical: spacing.s },
  zebra: { backgroundColor: '#F8F3EA' },
  selected: { backgroundColor: colors.infoSoft },
  pressed: { backgroundColor: colors.surfaceSunk },
  right: { textAlign: 'right' },
});
