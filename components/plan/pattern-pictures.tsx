import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import Svg, { Circle, G, Line, Path, Text as SvgText } from 'react-native-svg';
import { Tabular, Txt } from '@/components/ui';
import { colors, fonts, spacing } from '@/constants/theme';
import { BANDS, type BandName } from '@/shared/bands';
import { OPERATOR_WINDOWS, azimuthCut, elevationCut, feedSweep, resonanceInfo, type DipoleInput, type OperatorWindowId } from '@/shared/pattern';
import { azimuthPath, compassPoint, elevationPath, elevationPoint, elevationWedge, swrPath, swrPoint } from './pattern-geometry';

const SIZE = 260;
const R = 110;

/** compact: the elevation and azimuth pictures only (candidates compared side by side in narrow columns). */
type Props = { input: DipoleInput; band: BandName; wireAzimuthDeg: number; purpose: OperatorWindowId; testID: string; compact?: boolean };

/** The predicted elevation and azimuth patterns and the feed across the band, as pictures with numbers beside. */
export function PatternPictures({ input, band, wireAzimuthDeg, purpose, testID, compact }: Props) {
  // Drawn at SIZE and scaled down to fit a narrower column (three candidates side by side), never up.
  const [fitPx, setFitPx] = useState(SIZE);
  const k = Math.min(1, fitPx / SIZE);
  const win = OPERATOR_WINDOWS.find((w) => w.id === purpose)!;
  // The azimuth cut is taken in the middle of the station's angle window: where its contacts are.
  const azElevationDeg = Math.round((win.fromDeg + win.toDeg) / 2);
  const data = useMemo(() => {
    const elev = elevationCut(input, 1);
    const peak = elev.reduce((a, p) => (p.gainDbi > a.gainDbi ? p : a), elev[0]);
    const az = azimuthCut(input, azElevationDeg, 2);
    const azPeak = Math.max(...az.map((p) => p.gainDbi));
    const { lowMhz, highMhz } = BANDS[band];
    const sweep = feedSweep(input, lowMhz, highMhz, 31);
    const res = resonanceInfo(input, lowMhz, highMhz);
    return { elev, peak, az, azPeak, sweep, res, lowMhz, highMhz };
  }, [input, band, azElevationDeg]);
  const cx = SIZE / 2;
  const cy = SIZE / 2 + 40;
  const box = { x: 44, y: 16, width: SIZE - 60, height: 150 };
  const maxSwr = 4;
  const differ = data.res.zeroReactanceMhz !== null && Math.abs(data.res.zeroReactanceMhz - data.res.lowestSwrMhz) > 0.0005;
  return (
    <View style={styles.wrap} testID={testID} onLayout={(e) => setFitPx(Math.max(120, e.nativeEvent.layout.width))}>
      <View style={styles.picture}>
        <Txt variant="label">Elevation (broadside)</Txt>
        <Svg width={SIZE * k} height={(SIZE / 2 + 60) * k} viewBox={`0 0 ${SIZE} ${SIZE / 2 + 60}`} accessibilityLabel={`Elevation pattern: peak ${data.peak.gainDbi.toFixed(1)} dBi at ${data.peak.deg}° takeoff. Shaded: the ${win.label} window, ${win.fromDeg} to ${win.toDeg} degrees.`} testID={`${testID}-elevation`}>
          <Path d={elevationWedge(win.fromDeg, win.toDeg, cx, cy, R)} fill={colors.infoSoft} stroke={colors.info} strokeWidth={1} />
          {[1, 2 / 3, 1 / 3].map((f) => (
            <Path key={f} d={`M${cx - R * f} ${cy} A${R * f} ${R * f} 0 0 1 ${cx + R * f} ${cy}`} fill="none" stroke={colors.lineSoft} strokeWidth={1} />
          ))}
          <Line x1={cx - R - 6} y1={cy} x2={cx + R + 6} y2={cy} stroke={colors.line} strokeWidth={1.5} />
          <Path d={elevationPath(data.elev, data.peak.gainDbi, cx, cy, R)} fill="rgba(224,87,15,0.18)" stroke={colors.brand} strokeWidth={2.5} />
          <TakeoffMark deg={data.peak.deg} cx={cx} cy={cy} />
          <SvgText x={cx + R + 2} y={cy + 16} fontSize={12} fontFamily={fonts.mono} fill={colors.inkMuted} textAnchor="end">0°</SvgText>
          {data.peak.deg < 80 ? <SvgText x={cx} y={cy - R - 6} fontSize={12} fontFamily={fonts.mono} fill={colors.inkMuted} textAnchor="middle">90°</SvgText> : null}
        </Svg>
        <Tabular>Peak {data.peak.gainDbi.toFixed(1)} dBi at {data.peak.deg}° · rings 10 dB apart</Tabular>
        <Txt variant="caption" color={colors.info}>Shaded: {win.label}, {win.fromDeg}–{win.toDeg}°</Txt>
      </View>
      <View style={styles.picture}>
        <Txt variant="label">Azimuth at {azElevationDeg}° elevation (north up)</Txt>
        <Svg width={SIZE * k} height={SIZE * k} viewBox={`0 0 ${SIZE} ${SIZE}`} accessibilityLabel={`Azimuth pattern, north up; the wire runs ${wireAzimuthDeg.toFixed(0)}° and ${(wireAzimuthDeg + 180).toFixed(0)}°; the most signal goes broadside.`} testID={`${testID}-azimuth`}>
          {[1, 2 / 3, 1 / 3].map((f) => <Circle key={f} cx={cx} cy={SIZE / 2} r={R * f} fill="none" stroke={colors.lineSoft} strokeWidth={1} />)}
          <WireMark az={wireAzimuthDeg} cx={cx} cy={SIZE / 2} />
          <Path d={azimuthPath(data.az, data.azPeak, wireAzimuthDeg, cx, SIZE / 2, R)} fill="rgba(224,87,15,0.18)" stroke={colors.brand} strokeWidth={2.5} />
          <SvgText x={cx} y={12} fontSize={13} fontFamily={fonts.monoBold} fill={colors.ink} textAnchor="middle">N</SvgText>
        </Svg>
        <Txt variant="caption" color={colors.inkMuted}>Grey line: the wire. Rings 10 dB apart.</Txt>
      </View>
      {compact ? null : <View style={styles.picture}>
        <Txt variant="label">SWR on 50 Ω across {band}</Txt>
        <Svg width={SIZE} height={box.y + box.height + 34} testID={`${testID}-swr`} accessibilityLabel={`SWR across the band: lowest ${data.res.lowestSwr.toFixed(2)} at ${data.res.lowestSwrMhz.toFixed(3)} MHz.`}>
          {[1, 2, 3, 4].map((s) => {
            const p = swrPoint(data.lowMhz, s, data.lowMhz, data.highMhz, maxSwr, box);
            return (
              <G key={s}>
                <Line x1={box.x} y1={p.y} x2={box.x + box.width} y2={p.y} stroke={colors.lineSoft} strokeWidth={1} />
                <SvgText x={box.x - 6} y={p.y + 4} fontSize={12} fontFamily={fonts.mono} fill={colors.inkMuted} textAnchor="end">{s}</SvgText>
              </G>
            );
          })}
          <Path d={swrPath(data.sweep, data.lowMhz, data.highMhz, maxSwr, box)} fill="none" stroke={colors.brand} strokeWidth={2.5} />
          <FreqMark mhz={data.res.lowestSwrMhz} lowMhz={data.lowMhz} highMhz={data.highMhz} box={box} color={colors.ok} />
          {data.res.zeroReactanceMhz !== null ? <FreqMark mhz={data.res.zeroReactanceMhz} lowMhz={data.lowMhz} highMhz={data.highMhz} box={box} color={colors.info} dashed /> : null}
          <SvgText x={box.x} y={box.y + box.height + 18} fontSize={12} fontFamily={fonts.mono} fill={colors.inkMuted}>{data.lowMhz} MHz</SvgText>
          <SvgText x={box.x + box.width} y={box.y + box.height + 18} fontSize={12} fontFamily={fonts.mono} fill={colors.inkMuted} textAnchor="end">{data.highMhz} MHz</SvgText>
        </Svg>
        <Tabular testID={`${testID}-lowest-swr`}>Lowest SWR {data.res.lowestSwr.toFixed(2)} at {data.res.lowestSwrMhz.toFixed(3)} MHz (green)</Tabular>
        <Tabular>{data.res.zeroReactanceMhz !== null ? `Zero reactance at ${data.res.zeroReactanceMhz.toFixed(3)} MHz (blue, dashed)` : 'No zero-reactance point inside the band'}</Tabular>
        {differ ? <Txt variant="caption">These differ: the lowest SWR on 50 Ω falls where the resistance is nearest 50 Ω, not where the reactance is zero. Trim for the lowest SWR.</Txt> : null}
        <Tabular>Feed at {input.freqMhz.toFixed(3)} MHz: {data.sweep[15].resistanceOhm.toFixed(0)} {data.sweep[15].reactanceOhm >= 0 ? '+' : '−'} j{Math.abs(data.sweep[15].reactanceOhm).toFixed(0)} Ω</Tabular>
      </View>}
    </View>
  );
}

function TakeoffMark({ deg, cx, cy }: { deg: number; cx: number; cy: number }) {
  const p = elevationPoint(deg, 1.08, cx, cy, R);
  return (
    <G>
      <Line x1={cx} y1={cy} x2={p.x} y2={p.y} stroke={colors.ink} strokeWidth={1} strokeDasharray="4 3" />
      <SvgText x={p.x + 4} y={p.y} fontSize={12} fontFamily={fonts.mono} fill={colors.ink}>{deg}°</SvgText>
    </G>
  );
}

function WireMark({ az, cx, cy }: { az: number; cx: number; cy: number }) {
  const a = compassPoint(az, 1, cx, cy, R);
  const b = compassPoint(az + 180, 1, cx, cy, R);
  return <Line x1={a.x} y1={a.y} x2={b.x} y2={b.y} stroke={colors.line} strokeWidth={2} />;
}

function FreqMark({ mhz, lowMhz, highMhz, box, color, dashed }: { mhz: number; lowMhz: number; highMhz: number; box: { x: number; y: number; width: number; height: number }; color: string; dashed?: boolean }) {
  const x = swrPoint(mhz, 1, lowMhz, highMhz, 4, box).x;
  return <Line x1={x} y1={box.y} x2={x} y2={box.y + box.height} stroke={color} strokeWidth={2} strokeDasharray={dashed ? '5 4' : undefined} />;
}

const styles = StyleSheet.create({
  wrap: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.l },
  // Shrinks with a narrow column (the pictures scale with it) so its captions wrap instead of spilling over.
  picture: { gap: spacing.xs, maxWidth: SIZE + 10, flexShrink: 1 },
});
