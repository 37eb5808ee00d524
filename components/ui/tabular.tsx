import { Text, type TextProps } from 'react-native';
import { colors, fonts, type as typeScale } from '@/constants/theme';

type Props = TextProps & { strong?: boolean; size?: number; color?: string };

/** Figures in the mono face so columns of heights and distances line up. */
export function Tabular({ strong, size, color = colors.ink, style, ...rest }: Props) {
  return (
    <Text
      {...rest}
      style={[typeScale.mono, { color, fontFamily: strong ? fonts.monoBold : fonts.mono, fontVariant: ['tabular-nums'] }, size ? { fontSize: size, lineHeight: Math.round(size * 1.4) } : null, style]}
    />
  );
}
