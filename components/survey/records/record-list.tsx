import { StyleSheet, View } from 'react-native';
import { EmptyState, ListRow, Txt } from '@/components/ui';
import { colors, spacing } from '@/constants/theme';
import { useUnits } from '@/hooks/use-units';
import type { Hazard, OperatingPosition, Support } from '@/shared/schemas';
import type { FeatureRef } from '../plan/plan-features';
import { SyncBadge } from './sync-badge';
import { hazardSummary, positionSummary, supportSummary } from './record-summary';

type Props = {
  supports: Support[];
  hazards: Hazard[];
  positions: OperatingPosition[];
  selected: FeatureRef | null;
  onOpen: (ref: FeatureRef) => void;
};

export function RecordList({ supports, hazards, positions, selected, onOpen }: Props) {
  const { formatLengthM } = useUnits();
  if (supports.length + hazards.length + positions.length === 0) {
    return <EmptyState icon="tree" title="Nothing recorded yet" body="Walk to a tree or a mast spot and add it. Power lines first if you see any." testID="survey-empty" />;
  }
  const isSel = (id: string) => selected?.id === id;
  return (
    <View style={styles.wrap} testID="survey-record-list">
      <Section title={`Supports (${supports.length})`}>
        {supports.map((s) => (
          <ListRow key={s.id} testID={`record-${s.id}`} accessibilityLabel={`${s.label}, ${supportSummary(s, formatLengthM)}`} title={s.label} subtitle={supportSummary(s, formatLengthM)}
            icon={s.kind === 'tree' ? 'tree' : 'map-pin'} selected={isSel(s.id)} onPress={() => onOpen({ collection: 'supports', id: s.id })} right={<SyncBadge collection="supports" id={s.id} />} />
        ))}
      </Section>
      <Section title={`Hazards and ground features (${hazards.length})`}>
        {hazards.map((h) => (
          <ListRow key={h.id} testID={`record-${h.id}`} accessibilityLabel={`${h.label}, ${hazardSummary(h, formatLengthM)}`} title={h.label} subtitle={hazardSummary(h, formatLengthM)}
            icon={h.kind === 'power-line' ? 'triangle-alert' : 'map-pin'} selected={isSel(h.id)} onPress={() => onOpen({ collection: 'hazards', id: h.id })} right={<SyncBadge collection="hazards" id={h.id} />} />
        ))}
      </Section>
      <Section title={`Operating positions (${positions.length})`}>
        {positions.map((o) => (
          <ListRow key={o.id} testID={`record-${o.id}`} title={o.label} subtitle={positionSummary(o)} icon="map-pin" selected={isSel(o.id)}
            onPress={() => onOpen({ collection: 'operatingPositions', id: o.id })} right={<SyncBadge collection="operatingPositions" id={o.id} />} />
        ))}
      </Section>
    </View>
  );
}

function Section({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <View style={styles.section}>
      <Txt variant="label" color={colors.inkMuted} style={styles.head} accessibilityRole="header">{title.toUpperCase()}</Txt>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.l },
  section: { borderRadius: 10, overflow: 'hidden' },
  head: { paddingVertical: spacing.xs, letterSpacing: 0.5 },
});
