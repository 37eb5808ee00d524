import { StyleSheet, View, type StyleProp, type ViewStyle } from 'react-native';
import { colors, radii, shadow, spacing } from '@/constants/theme';
import { Txt } from './text';

type Props = { title?: string; children: React.ReactNode; style?: StyleProp<ViewStyle>; testID?: string; right?: React.ReactNode };

export function Card({ title, children, style, testID, right }: Props) {
  return (
    <View style={[styles.card, style]} testID={testID}>
      {title || right ? (
        <View style={styles.head}>
          {title ? (
            <Txt variant="title" style={styles.title} accessibilityRole="header">
              {title}
            </Txt>
          ) : null}
          {right}
        </View>
      ) : null}
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: colors.surface,
    borderRadius: radii.l,
    borderWidth: 1.5,
    borderColor: colors.lineSoft,
    padding: spacing.l,
    marginBottom: spacing.l,
    ...shadow.card,
  },
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: spacing.s, marginBottom: spacing.m },
  title: { flexShrink: 1 },
});
