import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { Circle, G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';
import { Button } from '@/components/ui';
import { colors, fonts, radii, spacing } from '@/constants/theme';
import { usePlanGestures } from '@/hooks/survey/use-plan-gestures';
import { useUnits } from '@/hooks/use-units';
import { featurePoints, featureRef, hitTest, type FeatureRef, type PlanFeature } from './plan-features';
import { HazardSymbol, POINT_LABEL_DY, PointSymbol, hazardLabelDy, hazardLabelText, midpoint } from './plan-symbols';
import { placeLabels, type LabelCandidate } from './label-placement';
import { planColors } from './plan-style';
import { boundsOf, fitToContent, screenToWorld, worldToScreen, zoomAbout, type PlanView, type WorldPoint } from './plan-transform';
import { niceFloor, scaleBar } from './scale-bar';

type Props = {
  features: PlanFeature[];
  me: { at: WorldPoint; accuracyM: number | null } | null;
  selected: FeatureRef | null;
  onSelect: (ref: FeatureRef | null) => void;
  /** Points being placed right now (a power line walked point by point), drawn as a dashed preview. */
  draft?: WorldPoint[];
  height: number;
  testID?: string;
  /** Drawn over the hazards and under the points (the plan screen's wire, circles and coax route). */
  overlay?: (toScreen: (p: WorldPoint) => { x: number; y: number }, pxPerM: number) => React.ReactNode;
};

/** The site drawn from local records alone: no map tiles, so it works in a park with no signal. */
export function SitePlan({ features, me, selected, onSelect, draft, height, testID = 'site-plan', overlay }: Props) {
  const { system } = useUnits();
  const ref = useRef<View>(null);
  const [size, setSize] = useState({ widthPx: 0, heightPx: height });
  const [view, setView] = useState<PlanView | null>(null);
  const [userMoved, setUserMoved] = useState(false);

  const contentPoints = useMemo(() => [...featurePoints(features), ...(me ? [me.at] : []), { eastM: 0, northM: 0 }], [features, me]);
  const fit = useCallback(() => fitToContent(boundsOf(contentPoints), size, 40), [contentPoints, size]);

  // Until the scout moves the plan, it keeps everything in view as records are added.
  useEffect(() => {
    if (size.widthPx > 0 && !userMoved) setView(fit());
  }, [fit, size.widthPx, userMoved]);

  const setByUser = useCallback((v: PlanView) => { setUserMoved(true); setView(v); }, []);
  const onTap = useCallback((at: { x: number; y: number }) => {
    if (!view) return;
    const hit = hitTest(features, view, size, at);
    onSelect(hit ? featureRef(hit) : null);
  }, [features, view, size, onSelect]);
  const handlers = usePlanGestures({ containerRef: ref, size, view, onView: setByUser, onTap });

  const onLayout = (e: LayoutChangeEvent) => setSize({ widthPx: Math.round(e.nativeEvent.layout.width), heightPx: Math.round(e.nativeEvent.layout.height) });
  const counts = countsOf(features);
  const shownLabels = useMemo(() => {
    if (!view) return new Map<string, number>();
    const cands: LabelCandidate[] = features.map((f) => {
      const sel = selected?.id === f.id ? 100 : 0;
      if (f.type === 'hazard') {
        const mid = midpoint(f.points.map((p) => worldToScreen(view, size, p))) ?? { x: -1e4, y: -1e4 };
        return { id: f.id, x: mid.x, y: mid.y + hazardLabelDy(f), text: hazardLabelText(f), priority: sel + (f.kind === 'power-line' ? 5 : 1) };
      }
      const at = worldToScreen(view, size, f.at);
      return { id: f.id, x: at.x, y: at.y + POINT_LABEL_DY, text: f.label, priority: sel + 2 };
    });
    return placeLabels(cands, size.widthPx, size.heightPx);
  }, [features, view, size, selected]);

  return (
    <View style={[styles.wrap, { height }]}>
      <View
        ref={ref}
        style={styles.canvas}
        onLayout={onLayout}
        testID={testID}
        accessibilityRole="image"
        accessibilityLabel={`Site plan: ${counts}. Drag to move, pinch or scroll to zoom, tap a symbol to open it.`}
        {...handlers}
      >
        {view && size.widthPx > 0 ? (
          <Svg width={size.widthPx} height={size.heightPx}>
            <Rect x={0} y={0} width={size.widthPx} height={size.heightPx} fill={planColors.ground} />
            <Grid view={view} size={size} />
            <RefMark at={worldToScreen(view, size, { eastM: 0, northM: 0 })} />
            {features.map((f) => {
              const isSel = !!selected && selected.id === f.id;
              if (f.type === 'hazard') return <HazardSymbol key={f.id} feature={f} points={f.points.map((p) => worldToScreen(view, size, p))} selected={isSel} showLabel={shownLabels.has(f.id)} labelDx={shownLabels.get(f.id)} />;
              return null;
            })}
            {overlay ? overlay((p) => worldToScreen(view, size, p), view.pxPerM) : null}
            {draft && draft.length > 0 ? <Draft points={draft.map((p) => worldToScreen(view, size, p))} /> : null}
            {me ? <Me at={worldToScreen(view, size, me.at)} radiusPx={(me.accuracyM ?? 0) * view.pxPerM} /> : null}
            {features.map((f) => (f.type === 'hazard' ? null : <PointSymbol key={f.id} feature={f} at={worldToScreen(view, size, f.at)} selected={!!selected && selected.id === f.id} showLabel={shownLabels.has(f.id)} labelDx={shownLabels.get(f.id)} />))}
            <NorthArrow x={size.widthPx - 30} y={34} />
            <ScaleBarMark view={view} heightPx={size.heightPx} system={system} />
          </Svg>
        ) : null}
      </View>
      <View style={styles.tools}>
        <Button label="+" accessibilityLabel="Zoom in" testID="plan-zoom-in" variant="secondary" compact onPress={() => view && setByUser(zoomAbout(view, size, { x: size.widthPx / 2, y: size.heightPx / 2 }, 1.6))} />
        <Button label="−" accessibilityLabel="Zoom out" testID="plan-zoom-out" variant="secondary" compact onPress={() => view && setByUser(zoomAbout(view, size, { x: size.widthPx / 2, y: size.heightPx / 2 }, 1 / 1.6))} />
        <Button label="All" accessibilityLabel="Show everything" testID="plan-fit" variant="secondary" compact onPress={() => { setUserMoved(false); setView(fit()); }} />
        {me ? <Button label="Me" icon="crosshair" accessibilityLabel="Centre on my position" testID="plan-centre-me" variant="secondary" compact onPress={() => view && setByUser({ ...view, centreEastM: me.at.eastM, centreNorthM: me.at.northM })} /> : null}
      </View>
    </View>
  );
}

function countsOf(features: PlanFeature[]): string {
  const n = (p: (f: PlanFeature) => boolean) => features.filter(p).length;
  return `${n((f) => f.type === 'support')} supports, ${n((f) => f.type === 'hazard')} hazards, ${n((f) => f.type === 'position')} operating positions`;
}

/** A light grid at the scale bar's step, heavier every fifth line, so distances can be judged by eye. */
function Grid({ view, size }: { view: PlanView; size: { widthPx: number; heightPx: number } }) {
  const stepM = niceFloor(70 / view.pxPerM);
  if (!(stepM > 0)) return null;
  const tl = screenToWorld(view, size, { x: 0, y: 0 });
  const br = screenToWorld(view, size, { x: size.widthPx, y: size.heightPx });
  const lines: React.ReactNode[] = [];
  for (let e = Math.ceil(tl.eastM / stepM) * stepM, i = 0; e <= br.eastM && i < 80; e += stepM, i++) {
    const x = worldToScreen(view, size, { eastM: e, northM: 0 }).x;
    const major = Math.abs(Math.round(e / stepM) % 5) === 0;
    lines.push(<Line key={`e${i}`} x1={x} y1={0} x2={x} y2={size.heightPx} stroke={major ? planColors.gridMajor : planColors.grid} strokeWidth={1} />);
  }
  for (let n = Math.ceil(br.northM / stepM) * stepM, i = 0; n <= tl.northM && i < 80; n += stepM, i++) {
    const y = worldToScreen(view, size, { eastM: 0, northM: n }).y;
    const major = Math.abs(Math.round(n / stepM) % 5) === 0;
    lines.push(<Line key={`n${i}`} x1={0} y1={y} x2={size.widthPx} y2={y} stroke={major ? planColors.gridMajor : planColors.grid} strokeWidth={1} />);
  }
  return <G>{lines}</G>;
}

function RefMark({ at }: { at: { x: number; y: number } }) {
  return (
    <G>
      <Line x1={at.x - 8} y1={at.y} x2={at.x + 8} y2={at.y} stroke={colors.inkMuted} strokeWidth={1.5} />
      <Line x1={at.x} y1={at.y - 8} x2={at.x} y2={at.y + 8} stroke={colors.inkMuted} strokeWidth={1.5} />
    </G>
  );
}

function Draft({ points }: { points: { x: number; y: number }[] }) {
  const d = points.map((p, i) => `${i === 0 ? 'M' : 'L'}${p.x} ${p.y}`).join(' ');
  return (
    <G>
      <Path d={d} fill="none" stroke={planColors.selected} strokeWidth={3} strokeDasharray="6 5" />
      {points.map((p, i) => <Circle key={i} cx={p.x} cy={p.y} r={6} fill={planColors.halo} stroke={planColors.selected} strokeWidth={3} />)}
    </G>
  );
}

function Me({ at, radiusPx }: { at: { x: number; y: number }; radiusPx: number }) {
  return (
    <G>
      {radiusPx > 2 ? <Circle cx={at.x} cy={at.y} r={radiusPx} fill={planColors.meAccuracy} stroke={planColors.me} strokeWidth={1} strokeOpacity={0.6} /> : null}
      <Circle cx={at.x} cy={at.y} r={9} fill={planColors.halo} />
      <Circle cx={at.x} cy={at.y} r={6} fill={planColors.me} />
    </G>
  );
}

function NorthArrow({ x, y }: { x: number; y: number }) {
  return (
    <G accessibilityLabel="North is up">
      <Circle cx={x} cy={y} r={20} fill={planColors.halo} stroke={colors.ink} strokeWidth={1.5} />
      <Path d={`M${x} ${y - 15} L${x + 7} ${y + 6} L${x} ${y + 2} L${x - 7} ${y + 6} Z`} fill={colors.ink} />
      <SvgText x={x} y={y + 17} fontSize={11} fontFamily={fonts.bold} fontWeight="700" textAnchor="middle" fill={colors.ink}>N</SvgText>
    </G>
  );
}

function ScaleBarMark({ view, heightPx, system }: { view: PlanView; heightPx: number; system: 'metric' | 'imperial' }) {
  const bar = scaleBar(view.pxPerM, 130, system);
  const x = 14, y = heightPx - 18;
  return (
    <G>
      <Rect x={x - 6} y={y - 24} width={bar.px + 20 + 9.5 * bar.label.length} height={34} rx={6} fill={planColors.halo} opacity={0.9} />
      <Line x1={x} y1={y} x2={x + bar.px} y2={y} stroke={colors.ink} strokeWidth={3} />
      <Line x1={x} y1={y - 7} x2={x} y2={y + 4} stroke={colors.ink} strokeWidth={2} />
      <Line x1={x + bar.px} y1={y - 7} x2={x + bar.px} y2={y + 4} stroke={colors.ink} strokeWidth={2} />
      <SvgText x={x + bar.px + 8} y={y + 4} fontSize={14} fontFamily={fonts.monoBold} fontWeight="700" fill={colors.ink} testID="plan-scale-label">{bar.label}</SvgText>
    </G>
  );
}

const styles = StyleSheet.create({
  wrap: { borderRadius: radii.l, overflow: 'hidden', borderWidth: 2, borderColor: colors.line, backgroundColor: planColors.ground },
  canvas: { flex: 1, touchAction: 'none', cursor: 'grab' } as object,
  tools: { position: 'absolute', left: spacing.s, top: spacing.s, flexDirection: 'row', gap: spacing.xs },
});
