import { Link } from 'expo-router';
import { ScrollView, StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/constants/theme';
import { Txt } from '@/components/ui';
import { useBreakpoint } from '@/hooks/use-breakpoint';
import { BrandMark } from '@/components/shell/brand-mark';
import { FieldArt } from './field-art';

type Props = { title: string; intro?: string; children: React.ReactNode; testID: string };

/** The frame of every page a person sees before signing in: the mark, what Loftline is for, the form. */
export function AuthFrame({ title, intro, children, testID }: Props) {
  const { isWide, width } = useBreakpoint();
  const form = (
    <View style={[styles.card, isWide && styles.cardWide]}>
      {!isWide ? (
        <View style={styles.brandSmall}>
          <BrandMark />
        </View>
      ) : null}
      <Txt variant="heading" accessibilityRole="header" testID={`${testID}-title`}>
        {title}
      </Txt>
      {intro ? (
        <Txt color={colors.inkMuted} style={styles.intro}>
          {intro}
        </Txt>
      ) : null}
      {children}
    </View>
  );
  return (
    <ScrollView style={styles.page} contentContainerStyle={[styles.content, isWide && styles.contentWide]} keyboardShouldPersistTaps="handled" testID={testID}>
      {isWide ? (
        <View style={styles.hero}>
          <BrandMark onDark size="l" />
          <Txt variant="title" color={colors.onShellBar} style={styles.tagline}>
            Plan where the wire antennas go, keep every mast and wire clear of power lines, and hand each crew one sheet per antenna.
          </Txt>
          <FieldArt width={Math.min(440, width * 0.36)} />
          <Txt variant="caption" color={colors.onShellBarMuted}>
            Works offline on the phone; syncs when the club is back in range.
          </Txt>
        </View>
      ) : null}
      <View style={styles.formCol}>{form}</View>
    </ScrollView>
  );
}

/** A link between the sign-in pages, big enough to hit. */
export function AuthLink({ href, label, testID }: { href: string; label: string; testID: string }) {
  return (
    <Link href={href} testID={testID} accessibilityLabel={label} style={styles.link}>
      <Txt variant="label" color={colors.action} style={styles.linkText}>
        {label}
      </Txt>
    </Link>
  );
}

const styles = StyleSheet.create({
  page: { flex: 1, backgroundColor: colors.paper },
  content: { padding: spacing.l, paddingTop: spacing.xl, flexGrow: 1 },
  contentWide: { flexDirection: 'row', padding: 0, paddingTop: 0, alignItems: 'stretch', minHeight: '100%' as unknown as number },
  hero: { width: '44%', backgroundColor: colors.shellBar, padding: spacing.xxxl, gap: spacing.xl, justifyContent: 'center', borderRightWidth: 4, borderRightColor: colors.brand },
  tagline: { maxWidth: 460, fontFamily: 'Inter_600SemiBold' },
  formCol: { flex: 1, justifyContent: 'center', alignItems: 'center', padding: spacing.l },
  card: { width: '100%', maxWidth: 480, gap: spacing.s },
  cardWide: { backgroundColor: colors.surface, borderRadius: radii.l, padding: spacing.xxl, borderWidth: 1.5, borderColor: colors.lineSoft },
  brandSmall: { marginBottom: spacing.l },
  intro: { marginBottom: spacing.m },
  link: { minHeight: 48, justifyContent: 'center', paddingVertical: spacing.m },
  linkText: { textDecorationLine: 'underline' },
});
