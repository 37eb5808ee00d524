import { Platform } from 'react-native';
import { Circle, G, Line, Path, Polygon, Polyline, Rect, Text as SvgText } from 'react-native-svg';
import { fonts } from '@/constants/theme';
import type { HazardFeature, PlanFeature } from './plan-features';
import { HAZARD_LOOK, planColors } from './plan-style';
import type { ScreenPoint } from './plan-transform';

/*
 * One symbol per kind, drawn in screen pixels so symbols stay the same size at every zoom: a tree is a
 * crown with a trunk dot, a mast spot a triangle with its top pulley, a structure a square, an operating
 * position a tent. Each has a text label on a pale halo so it reads over lines.
 */

function Label({ at, text, dy = POINT_LABEL_DY, dx = 0, color = planColors.label }: { at: ScreenPoint; text: string; dy?: number; dx?: number; color?: string }) {
  at = { x: at.x + dx, y: at.y };
  return (
    <>
      <SvgText x={at.x} y={at.y + dy} fontSize={13} fontFamily={fonts.semibold} fontWeight="600" textAnchor="middle" stroke={planColors.halo} strokeWidth={4} strokeLinejoin="round">
        {text}
      </SvgText>
      <SvgText x={at.x} y={at.y + dy} fontSize={13} fontFamily={fonts.semibold} fontWeight="600" textAnchor="middle" fill={color}>
        {text}
      </SvgText>
    </>
  );
}

/**
 * On the web each symbol's group carries its record's label (for screen readers and for tests that tap a
 * symbol); react-native-svg passes unknown props through to the DOM there.
 */
function symbolAttrs(f: PlanFeature): object {
  return Platform.OS === 'web' ? { 'aria-label': f.label, 'data-testid': `plan-symbol-${f.id}` } : {};
}

export function PointSymbol({ feature, at, selected, showLabel = true, labelDx = 0 }: { feature: Exclude<PlanFeature, HazardFeature>; at: ScreenPoint; selected: boolean; showLabel?: boolean; labelDx?: number }) {
  const ring = selected ? <Circle cx={at.x} cy={at.y} r={19} fill="none" stroke={planColors.selected} strokeWidth={3.5} /> : null;
  if (feature.type === 'position') {
    // A rounded square marked "OP": nothing else on the plan has this shape, and no triangle (the danger sign).
    return (
      <G {...symbolAttrs(feature)}>
        {ring}
        <Rect x={at.x - 12} y={at.y - 11} width={24} height={22} rx={5} fill={planColors.positionFill} stroke={planColors.position} strokeWidth={2.5} />
        <SvgText x={at.x} y={at.y + 4.5} fontSize={11} fontFamily={fonts.bold} fontWeight="700" textAnchor="middle" fill={planColors.position}>OP</SvgText>
        {showLabel ? <Label at={at} dx={labelDx} text={feature.label} /> : null}
      </G>
    );
  }
  if (feature.kind === 'tree') {
    return (
      <G {...symbolAttrs(feature)}>
        {ring}
        <Circle cx={at.x} cy={at.y} r={13} fill={planColors.treeCrown} stroke={planColors.tree} strokeWidth={2.5} />
        <Circle cx={at.x - 4} cy={at.y - 3} r={4.5} fill="none" stroke={planColors.tree} strokeWidth={1.5} />
        <Circle cx={at.x + 4.5} cy={at.y + 2} r={4} fill="none" stroke={planColors.tree} strokeWidth={1.5} />
        <Circle cx={at.x} cy={at.y} r={2.5} fill={planColors.tree} />
        {showLabel ? <Label at={at} dx={labelDx} text={feature.label} /> : null}
      </G>
    );
  }
  if (feature.kind === 'mast') {
    return (
      <G {...symbolAttrs(feature)}>
        {ring}
        <Polygon points={`${at.x},${at.y - 13} ${at.x + 11},${at.y + 9} ${at.x - 11},${at.y + 9}`} fill="#DFE8F8" stroke={planColors.mast} strokeWidth={2.5} strokeLinejoin="round" />
        <Line x1={at.x} y1={at.y - 13} x2={at.x} y2={at.y + 9} stroke={planColors.mast} strokeWidth={2} />
        <Circle cx={at.x} cy={at.y - 13} r={3} fill={planColors.mast} />
        {showLabel ? <Label at={at} dx={labelDx} text={feature.label} /> : null}
      </G>
    );
  }
  return (
    <G {...symbolAttrs(feature)}>
      {ring}
      <Rect x={at.x - 10} y={at.y - 10} width={20} height={20} fill="#EAE1CF" stroke={planColors.structure} strokeWidth={2.5} />
      <Line x1={at.x - 10} y1={at.y - 10} x2={at.x + 10} y2={at.y + 10} stroke={planColors.structure} strokeWidth={1.5} />
      {showLabel ? <Label at={at} dx={labelDx} text={feature.label} /> : null}
    </G>
  );
}

export function HazardSymbol({ feature, points, selected, showLabel = true, labelDx = 0 }: { feature: HazardFeature; points: ScreenPoint[]; selected: boolean; showLabel?: boolean; labelDx?: number }) {
  const look = HAZARD_LOOK[feature.kind];
  const pts = points.map((p) => `${p.x},${p.y}`).join(' ');
  const mid = midpoint(points);
  const isPower = feature.kind === 'power-line';
  const shape = feature.isArea && points.length >= 3
    ? <Polygon points={pts} fill={look.fill} stroke={look.stroke} strokeWidth={look.widthPx} strokeDasharray={look.dash} />
    : <Polyline points={pts} fill="none" stroke={look.stroke} strokeWidth={look.widthPx} strokeDasharray={look.dash} strokeLinecap="round" strokeLinejoin="round" />;
  return (
    <G {...symbolAttrs(feature)}>
      {selected ? <Polyline points={feature.isArea && points.length >= 3 ? `${pts} ${points[0].x},${points[0].y}` : pts} fill="none" stroke={planColors.selected} strokeWidth={look.widthPx + 10} strokeOpacity={0.55} strokeLinecap="round" strokeLinejoin="round" /> : null}
      {isPower ? <Polyline points={pts} fill="none" stroke={planColors.dangerBand} strokeWidth={26} strokeLinecap="round" strokeLinejoin="round" /> : null}
      {isPower ? <Polyline points={pts} fill="none" stroke="#FFFCF6" strokeWidth={look.widthPx + 3} strokeLinecap="round" strokeLinejoin="round" /> : null}
      {shape}
      {isPower ? points.map((p, i) => <Circle key={i} cx={p.x} cy={p.y} r={5} fill="#FFFCF6" stroke={planColors.danger} strokeWidth={2.5} />) : null}
      {isPower && mid ? <Bolt at={mid} /> : null}
      {mid && showLabel ? <Label at={mid} dx={labelDx} text={hazardLabelText(feature)} dy={hazardLabelDy(feature)} color={isPower ? planColors.danger : planColors.label} /> : null}
    </G>
  );
}

export const POINT_LABEL_DY = 26;
export const hazardLabelText = (f: HazardFeature) => (f.kind === 'power-line' ? `${f.label} (power line)` : f.label);
export const hazardLabelDy = (f: HazardFeature) => (f.kind === 'power-line' ? 30 : 5);

/** A lightning bolt in a triangle: the power-line sign, drawn at the middle of the line. */
function Bolt({ at }: { at: ScreenPoint }) {
  const { x, y } = at;
  return (
    <G>
      <Polygon points={`${x},${y - 15} ${x + 14},${y + 11} ${x - 14},${y + 11}`} fill="#FFEBB8" stroke={planColors.danger} strokeWidth={2.5} strokeLinejoin="round" />
      <Path d={`M${x + 1.5} ${y - 8} L${x - 4} ${y + 2} L${x + 1} ${y + 2} L${x - 1.5} ${y + 9} L${x + 5} ${y - 1} L${x} ${y - 1} Z`} fill={planColors.danger} />
    </G>
  );
}

export function midpoint(points: readonly ScreenPoint[]): ScreenPoint | null {
  if (points.length === 0) return null;
  if (points.length === 1) return points[0];
  // Halfway along the polyline, so the label sits on the line even when it bends.
  const lens = points.slice(1).map((p, i) => Math.hypot(p.x - points[i].x, p.y - points[i].y));
  let half = lens.reduce((a, b) => a + b, 0) / 2;
  for (let i = 0; i < lens.length; i++) {
    if (half <= lens[i] || i === lens.length - 1) {
      const t = lens[i] === 0 ? 0 : Math.min(1, half / lens[i]);
      return { x: points[i].x + t * (points[i + 1].x - points[i].x), y: points[i].y + t * (points[i + 1].y - points[i].y) };
    }
    half -= lens[i];
  }
  return points[0];
}
