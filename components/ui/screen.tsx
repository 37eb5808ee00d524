import { ScrollView, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { breakpoints, colors, spacing } from '@/constants/theme';
import { useBreakpoint } from '@/hooks/use-breakpoint';
import { Txt } from './text';

type Props = {
  title?: string;
  subtitle?: string;
  /** Buttons beside the title (wide) or under it (phone). */
  actions?: React.ReactNode;
  children: React.ReactNode;
  /** Narrow column for forms. */
  narrow?: boolean;
  /** The screen manages its own scrolling (two-pane layouts). */
  noScroll?: boolean;
  testID?: string;
};

export function Screen({ title, subtitle, actions, children, narrow, noScroll, testID }: Props) {
  const { isWide } = useBreakpoint();
  const insets = useSafeAreaInsets();
  const maxWidth = narrow ? breakpoints.formMaxPx : breakpoints.contentMaxPx;
  const head = title ? (
    <View style={[styles.head, isWide && styles.headWide]}>
      <View style={styles.titles}>
        <Txt variant={isWide ? 'display' : 'heading'} accessibilityRole="header" testID={testID ? `${testID}-title` : undefined}>
          {title}
        </Txt>
        {subtitle ? <Txt color={colors.inkMuted}>{subtitle}</Txt> : null}
      </View>
      {actions ? <View style={styles.actions}>{actions}</View> : null}
    </View>
  ) : null;
  const padding = { paddingHorizontal: isWide ? spacing.xxl : spacing.l, paddingTop: isWide ? spacing.xxl : spacing.l };
  if (noScroll) {
    return (
      <View style={[styles.fill, padding]} testID={testID}>
        <View style={[styles.column, { maxWidth }, styles.fill]}>
          {head}
          {children}
        </View>
      </View>
    );
  }
  return (
    <ScrollView style={styles.fill} contentContainerStyle={[padding, { paddingBottom: spacing.xxxl + insets.bottom }]} testID={testID} keyboardShouldPersistTaps="handled">
      <View style={[styles.column, { maxWidth }]}>
        {head}
        {children}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1, backgroundColor: colors.paper },
  column: { width: '100%', alignSelf: 'center' },
  head: { gap: spacing.m, marginBottom: spacing.xl },
  headWide: { flexDirection: 'row', alignItems: 'flex-end', justifyContent: 'space-between' },
  titles: { gap: spacing.xs, flexShrink: 1 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.s },
});
