import { Text, type TextProps, type TextStyle } from 'react-native';
import { colors, type as typeScale, type TypeVariant } from '@/constants/theme';

type Props = TextProps & { variant?: TypeVariant; color?: string; align?: TextStyle['textAlign'] };

/** All text in Loftline goes through this, so the type scale and ink colours stay consistent. */
export function Txt({ variant = 'body', color = colors.ink, align, style, ...rest }: Props) {
  return <Text {...rest} style={[typeScale[variant], { color, textAlign: align }, style]} />;
}
