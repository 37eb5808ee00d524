import Svg, { Circle, Path, Rect } from 'react-native-svg';
import type { IconName } from '@/constants/icons';
import { colors } from '@/constants/theme';

/*
 * Loftline's icons: simple strokes on a 24-unit grid, thick enough (2.2) to read in sunlight.
 * Each state icon has its own outline (octagon, triangle, circle, shield) so shape alone tells them apart.
 */

type Props = { name: IconName; size?: number; color?: string; accessibilityLabel?: string };

const paths: Record<IconName, (c: string) => React.ReactNode> = {
  pencil: () => <Path d="M4 20l1-4L16 5l3 3L8 19l-4 1zM14 7l3 3" />,
  hourglass: () => <Path d="M6 3h12M6 21h12M7 3c0 5 10 5 10 9s-10 4-10 9M17 3c0 5-10 5-10 9s10 4 10 9" />,
  return: () => <Path d="M9 5L4 10l5 5M4 10h10a6 6 0 010 12h-3" />,
  'check-shield': () => <Path d="M12 2l8 3v6c0 5-3.5 9-8 11-4.5-2-8-6-8-11V5l8-3zM8 12l3 3 5-6" />,
  'arrow-up': () => <Path d="M12 20V4M5 11l7-7 7 7" />,
  'arrow-down': () => <Path d="M12 4v16M5 13l7 7 7-7" />,
  'octagon-x': () => <Path d="M8 2h8l6 6v8l-6 6H8l-6-6V8l6-6zM9 9l6 6M15 9l-6 6" />,
  'triangle-alert': () => <Path d="M12 3L2 21h20L12 3zM12 10v5M12 18v.5" />,
  'check-circle': () => (
    <>
      <Circle cx={12} cy={12} r={9.5} />
      <Path d="M7.5 12.5l3 3 6-7" />
    </>
  ),
  'cloud-check': () => <Path d="M7 18a5 5 0 01-.5-10A6 6 0 0118 9a4.5 4.5 0 01-1 9H7zM9 13l2 2 4-4" />,
  'cloud-up': () => <Path d="M7 18a5 5 0 01-.5-10A6 6 0 0118 9a4.5 4.5 0 01-1 9H7zM12 16v-5M9.5 13l2.5-2.5 2.5 2.5" />,
  calendar: () => (
    <>
      <Rect x={3} y={5} width={18} height={16} rx={2} />
      <Path d="M3 10h18M8 3v4M16 3v4" />
    </>
  ),
  'map-pin': () => (
    <>
      <Path d="M12 22s7-6.5 7-12a7 7 0 00-14 0c0 5.5 7 12 7 12z" />
      <Circle cx={12} cy={10} r={2.5} />
    </>
  ),
  // Two supports with a wire between them: the plan.
  drafting: () => <Path d="M4 21V7M20 21V7M4 8c4 5 12 5 16 0M12 11v10" />,
  shield: () => <Path d="M12 2l8 3v6c0 5-3.5 9-8 11-4.5-2-8-6-8-11V5l8-3z" />,
  clipboard: () => (
    <>
      <Rect x={5} y={4} width={14} height={18} rx={2} />
      <Path d="M9 2h6v4H9zM8.5 11h7M8.5 15h7M8.5 19h4" />
    </>
  ),
  people: () => (
    <>
      <Circle cx={9} cy={8} r={3.5} />
      <Path d="M2 20c0-4 3-6 7-6s7 2 7 6M16 4.5a3.5 3.5 0 010 7M18 14c2.5.5 4 2.5 4 6" />
    </>
  ),
  gear: () => (
    <>
      <Circle cx={12} cy={12} r={3} />
      <Path d="M12 2v3M12 19v3M2 12h3M19 12h3M4.9 4.9L7 7M17 17l2.1 2.1M4.9 19.1L7 17M17 7l2.1-2.1" />
    </>
  ),
  more: () => <Path d="M5 12h.5M12 12h.5M19 12h.5" />,
  plus: () => <Path d="M12 5v14M5 12h14" />,
  'chevron-right': () => <Path d="M9 5l7 7-7 7" />,
  'chevron-down': () => <Path d="M5 9l7 7 7-7" />,
  back: () => <Path d="M15 5l-7 7 7 7" />,
  mail: () => (
    <>
      <Rect x={3} y={5} width={18} height={14} rx={2} />
      <Path d="M3 7l9 6 9-6" />
    </>
  ),
  'sign-out': () => <Path d="M10 4H5v16h5M15 8l4 4-4 4M19 12H9" />,
  crosshair: () => (
    <>
      <Circle cx={12} cy={12} r={7} />
      <Path d="M12 2v5M12 17v5M2 12h5M17 12h5" />
    </>
  ),
  trash: () => <Path d="M4 7h16M9 7V4h6v3M6 7l1 14h10l1-14M10 11v6M14 11v6" />,
  close: () => <Path d="M6 6l12 12M18 6L6 18" />,
  tree: () => <Path d="M12 22v-6M12 2l6 9h-3l4 5H5l4-5H6l6-9z" />,
  // The mark: a wire lofted between a tall support and a shorter one, sagging between them.
  logo: () => <Path d="M5 21V4M19 21V9M5 5Q12 13 19 10M2 21h20" />,
};

export function Icon({ name, size = 24, color = colors.ink, accessibilityLabel }: Props) {
  return (
    <Svg
      width={size}
      height={size}
      viewBox="0 0 24 24"
      fill="none"
      stroke={color}
      strokeWidth={2.2}
      strokeLinecap="round"
      strokeLinejoin="round"
      accessibilityLabel={accessibilityLabel}
      accessible={!!accessibilityLabel}
    >
      {paths[name](color)}
    </Svg>
  );
}
