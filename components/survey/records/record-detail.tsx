import { StyleSheet, View } from 'react-native';
import { Button, Tabular, Txt } from '@/components/ui';
import { PhotoStrip } from '@/components/photos';
import { colors, radii, spacing } from '@/constants/theme';
import { useUnits } from '@/hooks/use-units';
import type { Hazard, Measurement, OperatingPosition, Support } from '@/shared/schemas';
import { HAZARD_KIND_LABEL, VOLTAGE_HELP } from '../forms/hazard-form-logic';
import { PowerLineCaution } from '../forms/power-line-caution';
import type { FeatureRef } from '../plan/plan-features';
import { SyncBadge } from './sync-badge';
import { LAUNCH_LABEL, SUPPORT_KIND_LABEL } from './record-summary';

type Props = {
  siteId: string;
  target: FeatureRef;
  record: Support | Hazard | OperatingPosition;
  measurements: Measurement[];
  canEdit: boolean;
  onEdit: () => void;
  onDelete: () => void;
  onClose: () => void;
};

const METHOD_WORDS: Record<string, string> = {
  'averaged-fix': 'GPS fix averaged where it stands', offset: 'Placed by distance and bearing', tangent: 'Clinometer, level ground', 'two-angle': 'Clinometer, top and base angles',
  percent: 'Percent-scale clinometer', sine: 'Rangefinder slant distance and angle', typed: 'Typed in',
};

export function RecordDetail({ siteId, target, record, measurements, canEdit, onEdit, onDelete, onClose }: Props) {
  const { formatLengthM } = useUnits();
  const rows: [string, string][] = [];
  let kindLabel = 'Operating position';
  if (target.collection === 'supports') {
    const s = record as Support;
    kindLabel = SUPPORT_KIND_LABEL[s.kind];
    rows.push(['Height', formatLengthM(s.heightM)], ['Usable attachment', formatLengthM(s.attachHeightM)], ['Wire ends', String(s.maxEnds)]);
    if (s.kind === 'mast') rows.push(['Mast', s.mastModel || '—']);
    else rows.push(['Line goes up by', s.launchMethod ? LAUNCH_LABEL[s.launchMethod] : '—']);
    if (s.species) rows.push(['Species', s.species]);
    if (s.condition) rows.push(['Condition', s.condition]);
    rows.push(['Position', `${s.lat.toFixed(6)}, ${s.lon.toFixed(6)} (±${formatLengthM(s.positionAccuracyM)})`]);
  } else if (target.collection === 'hazards') {
    const h = record as Hazard;
    kindLabel = HAZARD_KIND_LABEL[h.kind];
    if (h.kind === 'power-line') {
      rows.push(['Voltage class', VOLTAGE_HELP[h.voltageClass ?? 'unknown'].label + (h.voltageClass === 'unknown' || !h.voltageClass ? ' (planned as transmission)' : '')]);
      rows.push(['Voltage', h.voltageKv !== null ? `${h.voltageKv} kV` : 'not known'], ['Lowest wire', h.heightM !== null ? `about ${formatLengthM(h.heightM)}` : 'not estimated']);
    }
    rows.push([h.isArea ? 'Corners' : 'Points', String(h.points.length)]);
  } else {
    const o = record as OperatingPosition;
    rows.push(['Position', `${o.lat.toFixed(6)}, ${o.lon.toFixed(6)}`]);
  }
  if (record.notes) rows.push(['Notes', record.notes]);
  const readings = measurements.filter((m) => m.subjectId === record.id && !m.deletedAt).sort((a, b) => b.takenAt.localeCompare(a.takenAt));

  return (
    <View testID="record-detail" style={styles.wrap}>
      <View style={styles.head}>
        <View style={styles.grow}>
          <Txt variant="caption" color={colors.inkMuted}>{kindLabel.toUpperCase()}</Txt>
          <Txt variant="title" testID="record-detail-title">{record.label}</Txt>
        </View>
        <SyncBadge collection={target.collection} id={record.id} testID="record-detail-sync" />
      </View>
      {target.collection === 'hazards' && (record as Hazard).kind === 'power-line' ? <PowerLineCaution testID="record-power-caution" /> : null}
      <View style={styles.table}>
        {rows.map(([k, v]) => (
          <View key={k} style={styles.row}>
            <Txt variant="label" color={colors.inkMuted} style={styles.key}>{k}</Txt>
            {/\d/.test(v) && !/[a-z]{4}/i.test(v) ? <Tabular style={styles.grow}>{v}</Tabular> : <Txt style={styles.grow}>{v}</Txt>}
          </View>
        ))}
      </View>
      {readings.length > 0 ? (
        <View style={styles.readings} testID="record-measurements">
          <Txt variant="label">Readings kept</Txt>
          {readings.map((m) => (
            <Txt key={m.id} variant="caption" testID={`measurement-${m.kind}`}>
              {m.kind === 'height' ? `Height ${formatLengthM(m.valueM)}` : `Fix ±${formatLengthM(m.valueM)}`} · {METHOD_WORDS[m.method] ?? m.method} · {new Date(m.takenAt).toLocaleString()}
            </Txt>
          ))}
        </View>
      ) : null}
      <View style={{ height: spacing.s }} />
      <PhotoStrip siteId={siteId} subjectCollection={target.collection} subjectId={record.id} />
      <View style={styles.actions}>
        {canEdit ? <Button label="Edit" icon="pencil" testID="record-edit" onPress={onEdit} style={styles.grow} /> : null}
        {canEdit ? <Button label="Delete" icon="trash" variant="danger" testID="record-delete" onPress={onDelete} /> : null}
        <Button label="Close" variant="quiet" testID="record-close" onPress={onClose} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.s },
  head: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.s },
  grow: { flex: 1 },
  table: { borderRadius: radii.m, borderWidth: 1.5, borderColor: colors.lineSoft, backgroundColor: colors.surface },
  row: { flexDirection: 'row', gap: spacing.m, paddingVertical: spacing.s, paddingHorizontal: spacing.m, borderBottomWidth: 1, borderBottomColor: colors.lineSoft },
  key: { width: 130 },
  readings: { gap: spacing.xxs, padding: spacing.m, backgroundColor: colors.surfaceSunk, borderRadius: radii.m },
  actions: { flexDirection: 'row', gap: spacing.s, marginTop: spacing.m, flexWrap: 'wrap' },
});
