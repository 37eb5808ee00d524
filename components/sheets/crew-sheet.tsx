import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Card, ErrorText, NumberField, Tabular, Txt } from '@/components/ui';
import { PhotoThumb } from '@/components/photos/photo-thumb';
import { PhotoViewer } from '@/components/photos/photo-viewer';
import { CautionsBox } from '@/components/plan/cautions-box';
import { SpotStateBadge } from '@/components/plan/spot-state-badge';
import { legBearingsDeg, legEndOutM } from '@/components/plan/leg-text';
import { colors, spacing } from '@/constants/theme';
import type { EventRecords } from '@/hooks/plan/use-event-records';
import { useMutate } from '@/hooks/sync';
import { webData } from './print-style';
import { useUnits } from '@/hooks/use-units';
import type { SpotEvaluation } from '@/shared/review';
import type { Photo } from '@/shared/schemas';

/** One antenna's sheet for the crew: what to cut, where to hang it, what to rope off, and its status on the day. */
export function CrewSheet({ records, evaluation: s, canMark }: { records: EventRecords; evaluation: SpotEvaluation; canMark: boolean }) {
  const { formatLengthM } = useUnits();
  const mutate = useMutate();
  const [swr, setSwr] = useState<number | null>(s.spot.measuredSwr);
  const [error, setError] = useState<string | null>(null);
  const [photo, setPhoto] = useState<Photo | null>(null);
  const c = s.evaluated?.candidate;
  const station = records.stations.find((x) => x.id === s.spot.stationId);
  const coax = records.coax.find((x) => x.id === s.spot.coaxId);
  const mark = (state: 'up' | 'down') => {
    const measuredSwr = swr === null || Number.isNaN(swr) ? null : swr;
    if (measuredSwr !== null && (measuredSwr < 1 || measuredSwr > 100)) return setError('SWR is a number from 1 to 100, such as 1.4.');
    mutate.update('antennaSpots', s.spot.id, { state, measuredSwr, stateReason: state === 'up' ? 'Raised by the crew' : 'Lowered by the crew' }).then(() => setError(null), (e: Error) => setError(e.message));
  };
  if (!c) return <Card testID={`sheet-${s.spot.id}`}><ErrorText boxed message="This spot can no longer be built from the current records: ask the lead." testID="sheet-unbuildable" /></Card>;
  const legM = c.wireLengthM / 2;
  return (
    <View style={styles.sheet} testID={`sheet-${s.spot.id}`} {...webData({ sheet: 'page' })}>
      <View style={styles.head}>
        <Txt variant="heading">{station?.name ?? 'Station'} · {c.band}</Txt>
        <SpotStateBadge state={s.review.state} testID={`sheet-state-${s.spot.id}`} />
      </View>
      <Txt>{station ? `${station.mode.toUpperCase()}, ${station.powerW} W` : ''}</Txt>
      <Card title="Wire">
        <Tabular testID="sheet-wire">{c.shape === 'flat' ? 'Flat-top dipole' : `Inverted-V dipole, apex angle ${c.apexDeg}°`}: cut {formatLengthM(c.wireLengthM)} in all, two legs of {formatLengthM(legM)} from the centre insulator</Tabular>
        <Tabular>Feed point {formatLengthM(c.feedHeightM)} up · wire runs {c.wireAzimuthDeg.toFixed(0)}°/{(c.wireAzimuthDeg + 180).toFixed(0)}° · broadside {c.broadsideDeg.map((d) => `${d.toFixed(0)}°`).join(' and ')}</Tabular>
        {c.ropeEachEndM !== null ? <Tabular testID="sheet-rope">Rope each end: {formatLengthM(c.ropeEachEndM)} from the end insulator to the support (span {formatLengthM(c.spanM)}, sag about {formatLengthM(c.sagM)})</Tabular> : (
          <>
            <Tabular testID="sheet-legs">Run one leg toward {legBearingsDeg(c.wireAzimuthDeg)[0]} and the other toward {legBearingsDeg(c.wireAzimuthDeg)[1]} (true, from the apex): each leg end comes down {formatLengthM(legEndOutM(c))} out from the foot of {records.supports.find((x) => x.id === s.spot.supportIds[0])?.label ?? 'the support'}{s.spot.legAzimuthDeg === null ? ' (the direction the engine found best; the lead chose none)' : ''}</Tabular>
            <Tabular testID="sheet-rope">Leg ends about {formatLengthM(c.endHeightsM[0])} up: tie off with rope to stakes outside the keep-out circle</Tabular>
          </>
        )}
        <Txt variant="caption">Trim for the lowest SWR at the operating frequency; the cut is a starting length.</Txt>
      </Card>
      <Card title="Supports">
        {s.spot.supportIds.map((id) => {
          const sup = records.supports.find((x) => x.id === id);
          const photos = records.photos.filter((p) => p.deletedAt === null && p.subjectId === id);
          return (
            <View key={id} style={styles.support}>
              <Txt variant="bodyStrong">{sup?.label ?? 'A removed support'}</Txt>
              {sup ? <Tabular>{sup.kind}, {formatLengthM(sup.heightM)} tall · attach at {formatLengthM(sup.attachHeightM ?? sup.heightM)}{sup.launchMethod && sup.launchMethod !== 'none' ? ` · line up by ${sup.launchMethod}` : ''}</Tabular> : null}
              {sup?.condition ? <Txt variant="caption">{sup.condition}</Txt> : null}
              <View style={styles.photos}>{photos.map((p) => <PhotoThumb key={p.id} photo={p} onOpen={setPhoto} />)}</View>
            </View>
          );
        })}
      </Card>
      <Card title="Coax">
        <Tabular testID="sheet-coax">{coax ? `${coax.label}: ${coax.type}, ${formatLengthM(coax.lengthM)}` : 'No piece assigned: bring one long enough'}{c.coax ? ` · run about ${formatLengthM(c.coax.runM)} to the operating position` : ''}</Tabular>
      </Card>
      <Card title="Keep out (rope off)">
        {c.footprint.map((f) => (
          <Tabular key={f.supportId} testID={`sheet-fall-${f.supportId}`}>Fall zone around {records.supports.find((x) => x.id === f.supportId)?.label ?? 'the support'}: {formatLengthM(f.heightM)} radius while raising and lowering</Tabular>
        ))}
        <Tabular testID="sheet-exposure">Public at least {formatLengthM(c.exposure.uncontrolledM)} from the wire; operators at least {formatLengthM(c.exposure.controlledM)}</Tabular>
      </Card>
      <Card title="On the day">
        <Tabular testID="sheet-swr-predicted">Predicted SWR {c.pattern.swr50.toFixed(2)} at band centre{s.spot.measuredSwr !== null ? ` · measured ${s.spot.measuredSwr.toFixed(2)}` : ''}</Tabular>
        {canMark ? (
          <View style={styles.day}>
            <NumberField label="Measured SWR" testID="sheet-swr" value={swr} onChange={setSwr} />
            <View style={styles.buttons}>
              <Button label="Mark up" icon="arrow-up" testID="sheet-mark-up" onPress={() => mark('up')} disabled={s.review.state !== 'cleared' && s.review.state !== 'down' && s.review.state !== 'up'} />
              <Button label="Mark down" icon="arrow-down" variant="secondary" testID="sheet-mark-down" onPress={() => mark('down')} />
            </View>
            {error ? <ErrorText message={error} testID="sheet-error" /> : null}
          </View>
        ) : null}
      </Card>
      <CautionsBox testID={`sheet-cautions-${s.spot.id}`} />
      {photo ? <PhotoViewer photo={photo} onClose={() => setPhoto(null)} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  sheet: { gap: spacing.s, marginBottom: spacing.xxl },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.m },
  support: { gap: spacing.xs, marginBottom: spacing.m },
  photos: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.s },
  day: { gap: spacing.s, marginTop: spacing.s },
  buttons: { flexDirection: 'row', gap: spacing.s, flexWrap: 'wrap' },
});
