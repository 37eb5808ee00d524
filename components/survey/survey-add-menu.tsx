import { StyleSheet, View } from 'react-native';
import { Button } from '@/components/ui';
import { spacing } from '@/constants/theme';
import type { IconName } from '@/constants/icons';
import type { SurveyPanel } from './survey-panel';

const ITEMS: { label: string; icon: IconName; panel: SurveyPanel; testID: string; danger?: boolean }[] = [
  { label: 'Tree', icon: 'tree', panel: { type: 'add-support', kind: 'tree' }, testID: 'add-tree' },
  { label: 'Mast spot', icon: 'arrow-up', panel: { type: 'add-support', kind: 'mast' }, testID: 'add-mast' },
  { label: 'Structure', icon: 'map-pin', panel: { type: 'add-support', kind: 'structure' }, testID: 'add-structure' },
  { label: 'Power line', icon: 'triangle-alert', panel: { type: 'add-hazard', kind: 'power-line' }, testID: 'add-power-line', danger: true },
  { label: 'Path, road, parking…', icon: 'map-pin', panel: { type: 'add-hazard', kind: 'path' }, testID: 'add-hazard' },
  { label: 'Operating position', icon: 'plus', panel: { type: 'add-position' }, testID: 'add-position' },
  { label: 'Ground', icon: 'drafting', panel: { type: 'ground' }, testID: 'edit-ground' },
  { label: 'Site notes', icon: 'clipboard', panel: { type: 'notes' }, testID: 'edit-notes' },
];

/** Big buttons for what a scout adds, two to a row on a phone so a thumb reaches them. */
export function SurveyAddMenu({ onOpen, columns }: { onOpen: (p: SurveyPanel) => void; columns: number }) {
  return (
    <View style={styles.grid} testID="survey-add-menu">
      {ITEMS.map((it) => (
        <View key={it.testID} style={{ width: `${100 / columns}%`, padding: spacing.xs }}>
          <Button label={it.label} icon={it.icon} testID={it.testID} variant={it.danger ? 'danger' : 'secondary'} onPress={() => onOpen(it.panel)} style={styles.btn} />
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', marginHorizontal: -spacing.xs, marginBottom: spacing.m },
  btn: { minHeight: 56 },
});
