import Svg, { Circle, Line, Path, Rect } from 'react-native-svg';
import { colors } from '@/constants/theme';

/**
 * The picture on the sign-in pages: a field at dusk, a dipole strung between two trees, a mast with a
 * feed line, and a power line kept well away behind its fall circle. Drawn here; no stock art.
 */
export function FieldArt({ width = 420 }: { width?: number }) {
  const h = width * 0.62;
  return (
    <Svg width={width} height={h} viewBox="0 0 420 260" accessibilityLabel="A dipole strung between two trees, away from a power line">
      <Rect x={0} y={0} width={420} height={260} fill="#1D2833" />
      <Circle cx={340} cy={58} r={26} fill="#F2B36B" opacity={0.9} />
      <Rect x={0} y={200} width={420} height={60} fill="#2D3B2A" />
      {/* power line far right, with its fall circle */}
      <Line x1={388} y1={200} x2={388} y2={110} stroke="#8E99A4" strokeWidth={4} />
      <Line x1={376} y1={116} x2={400} y2={116} stroke="#8E99A4" strokeWidth={3} />
      <Path d="M300 205 A 88 22 0 0 1 476 205" stroke={colors.danger} strokeWidth={2.5} strokeDasharray="6 6" fill="none" />
      {/* trees */}
      <Path d="M60 200 L60 150 M30 160 L60 60 L90 160 Z" stroke="#7FA36B" strokeWidth={3} fill="#3F5A36" />
      <Path d="M250 200 L250 160 M224 168 L250 84 L276 168 Z" stroke="#7FA36B" strokeWidth={3} fill="#3F5A36" />
      {/* the dipole: sagging wire between the trees, centre insulator and feed line to the tent */}
      <Path d="M62 78 Q 156 104 248 98" stroke={colors.brand} strokeWidth={3.5} fill="none" />
      <Circle cx={156} cy={92} r={5} fill={colors.surface} />
      <Path d="M156 97 Q 150 160 132 196" stroke="#E8DFC9" strokeWidth={2.5} fill="none" />
      <Path d="M106 200 L132 180 L158 200 Z" fill={colors.surface} />
      {/* portable mast */}
      <Line x1={176} y1={200} x2={176} y2={132} stroke="#C9C0AE" strokeWidth={3} />
      <Line x1={176} y1={134} x2={160} y2={200} stroke="#C9C0AE" strokeWidth={1.5} />
      <Line x1={176} y1={134} x2={192} y2={200} stroke="#C9C0AE" strokeWidth={1.5} />
    </Svg>
  );
}
