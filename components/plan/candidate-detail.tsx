import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Card, Tabular, Txt } from '@/components/ui';
import { colors, spacing } from '@/constants/theme';
import { useUnits } from '@/hooks/use-units';
import { evaluateSpot, type Candidate } from '@/shared/plan';
import type { OperatorWindowId } from '@/shared/pattern';
import type { SiteRecords } from '@/shared/review';
import type { SiteFile } from '@/shared/schemas/site-file';
import { CautionsBox } from './cautions-box';
import { ClearanceList } from './clearance-list';
import { PatternPictures } from './pattern-pictures';
import { ClearanceBadge } from './spot-state-badge';
import { labelsOf, withLabels } from './label-ids';
import { legEndOutM, legsText } from './leg-text';

type Props = {
  records: SiteRecords;
  file: SiteFile;
  candidate: Candidate;
  purpose: OperatorWindowId;
  supportLabel: (id: string) => string;
  onAssign?: () => void;
  assignLabel?: string;
  compact?: boolean;
  testID: string;
};

/** Everything about one candidate spot: where, how it radiates, what its feed does, and what was checked. */
export function CandidateDetail({ records, file, candidate: c, purpose, supportLabel, onAssign, assignLabel, compact, testID }: Props) {
  const { formatLengthM } = useUnits();
  // The bearing as well as the id: a typed leg bearing is not among the engine's directions, so its id alone finds nothing.
  const input = useMemo(
    () => evaluateSpot(file, { stationId: c.stationId, band: c.band, shape: c.shape, supportIds: c.supportIds, geometryId: c.id, legAzimuthDeg: c.shape === 'inverted-v' ? c.wireAzimuthDeg : null })?.patternInput ?? null,
    [file, c],
  );
  const labels = useMemo(() => labelsOf(records.supports, records.hazards, records.operatingPositions, records.stations, records.coax), [records]);
  const where = c.shape === 'flat' ? `Flat-top between ${c.supportIds.map(supportLabel).join(' and ')}` : `Inverted-V from ${supportLabel(c.supportIds[0])}`;
  return (
    // Side by side the columns are narrow: the clearance badge goes under the title instead of beside it.
    <Card testID={testID} title={`${c.band} · ${where}`} right={compact ? undefined : <ClearanceBadge level={c.level} testID={`${testID}-level`} />}>
      {compact ? <View style={styles.badge}><ClearanceBadge level={c.level} testID={`${testID}-level`} /></View> : null}
      <Txt variant="bodyStrong">{c.summary}</Txt>
      <Tabular>Score {c.score.toFixed(2)} · wire {formatLengthM(c.wireLengthM)} · feed {formatLengthM(c.feedHeightM)} high ({c.heightWavelengths.toFixed(2)} λ)</Tabular>
      <Tabular>Broadside {c.broadsideDeg.map((d) => `${d.toFixed(0)}°`).join(' and ')} · wire runs {c.wireAzimuthDeg.toFixed(0)}°{c.apexDeg ? ` · apex ${c.apexDeg}°` : ''}</Tabular>
      {c.shape === 'inverted-v' ? (
        <Tabular testID={`${testID}-legs`}>
          Inverted-V {legsText(c.wireAzimuthDeg)} true from the apex · each leg end comes down {formatLengthM(legEndOutM(c))} out from the support, {formatLengthM(c.endHeightsM[0])} up
        </Tabular>
      ) : null}
      {c.explanation.map((l) => <Txt key={l} variant="caption">• {withLabels(l, labels)}</Txt>)}
      {c.coax ? (
        <Tabular>Coax run {formatLengthM(c.coax.runM)} to the operating position{c.coax.best ? ` · ${c.coax.best.type} ${formatLengthM(c.coax.best.lengthM)}${c.coax.best.totalDb !== null ? `, ${c.coax.best.totalDb.toFixed(1)} dB` : ''}` : ' · no piece in the inventory reaches'}</Tabular>
      ) : null}
      <Tabular>Keep the public {formatLengthM(c.exposure.uncontrolledM)} and operators {formatLengthM(c.exposure.controlledM)} from the wire (RF exposure, {c.exposure.averagePowerW.toFixed(0)} W average)</Tabular>
      {onAssign ? (
        <View style={styles.assign}>
          <Button label={assignLabel ?? 'Assign this spot'} icon="check-circle" testID={`${testID}-assign`} onPress={onAssign} variant={c.level === 'blocked' ? 'danger' : 'primary'} />
          {c.level === 'blocked' ? <Txt variant="caption" color={colors.danger}>Blocked: it can be drawn, but no one can clear it to raise.</Txt> : null}
        </View>
      ) : null}
      {input ? <PatternPictures input={input} band={c.band} wireAzimuthDeg={c.wireAzimuthDeg} purpose={purpose} compact={compact} testID={`${testID}-pattern`} /> : null}
      {compact && input ? <Tabular>Takeoff {Math.round(c.pattern.takeoffDeg)}° · peak {c.pattern.peakGainDbi.toFixed(1)} dBi · SWR {c.pattern.swr50.toFixed(2)}</Tabular> : null}
      <Txt variant="label" style={styles.head}>Clearances</Txt>
      <ClearanceList clearances={c.clearances} labels={labels} testID={`${testID}-clearances`} />
      <CautionsBox testID={`${testID}-cautions`} />
    </Card>
  );
}

const styles = StyleSheet.create({
  assign: { gap: spacing.xs, marginVertical: spacing.m },
  badge: { alignItems: 'flex-start' },
  head: { marginTop: spacing.m, marginBottom: spacing.s },
});
