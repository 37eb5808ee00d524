import { StyleSheet, View } from 'react-native';
import { Button, Txt } from '@/components/ui';
import { colors, radii, spacing } from '@/constants/theme';
import type { Site } from '@/shared/schemas';
import { SyncBadge } from './sync-badge';

/** The site-wide facts a scout records once: the ground and the notes on access and rules. */
export function SiteSummary({ site, canEdit, onGround, onNotes }: { site: Site; canEdit: boolean; onGround: () => void; onNotes: () => void }) {
  const ground = site.groundClass
    ? `${site.groundDescription || 'Described'} → ${site.groundClass}`
    : site.groundSigmaSPerM !== null ? `By value: σ ${site.groundSigmaSPerM} S/m, εr ${site.groundEpsR}` : 'Not recorded yet';
  const notes = [site.accessNotes, site.rules].filter(Boolean).join(' · ');
  return (
    <View style={styles.box} testID="site-summary">
      <View style={styles.row}>
        <Txt variant="label" style={styles.grow}>The site</Txt>
        <SyncBadge collection="sites" id={site.id} testID="site-summary-sync" />
      </View>
      <View style={styles.row}>
        <View style={styles.grow}>
          <Txt variant="label" color={colors.inkMuted}>Ground</Txt>
          <Txt testID="site-summary-ground">{ground}</Txt>
        </View>
        {canEdit ? <Button label="Edit" compact variant="quiet" testID="site-summary-ground-edit" accessibilityLabel="Edit the ground" onPress={onGround} /> : null}
      </View>
      <View style={styles.row}>
        <View style={styles.grow}>
          <Txt variant="label" color={colors.inkMuted}>Access and rules</Txt>
          <Txt numberOfLines={3} testID="site-summary-notes">{notes || 'Not recorded yet'}</Txt>
        </View>
        {canEdit ? <Button label="Edit" compact variant="quiet" testID="site-summary-notes-edit" accessibilityLabel="Edit the site notes" onPress={onNotes} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { backgroundColor: colors.surface, borderRadius: radii.l, borderWidth: 1.5, borderColor: colors.lineSoft, padding: spacing.m, gap: spacing.m, marginBottom: spacing.l },
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.s },
  grow: { flex: 1 },
});
