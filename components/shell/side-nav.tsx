import { useRouter } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { breakpoints, colors, radii, spacing, touchTargetPx } from '@/constants/theme';
import { Icon, Txt } from '@/components/ui';
import { useSession } from '@/hooks/auth/use-session';
import { BrandMark } from './brand-mark';
import { ClubSwitcher } from './club-switcher';
import type { NavItem, NavKey } from './nav-items';
import { SyncIndicatorSlot } from './sync-slot';

/** Wide screens: every place listed down the left, the club on top, the person at the bottom. */
export function SideNav({ items, active }: { items: NavItem[]; active: NavKey | null }) {
  const router = useRouter();
  const { user } = useSession();
  return (
    <View style={styles.nav} role="navigation" testID="side-nav">
      <View style={styles.brand}>
        <BrandMark onDark />
      </View>
      <View style={styles.club}>
        <ClubSwitcher onDark />
      </View>
      <View style={styles.sync}>
        <SyncIndicatorSlot />
      </View>
      <View style={styles.items}>
        {items.map((item) => {
          const on = item.key === active;
          return (
            <Pressable
              key={item.key}
              testID={`nav-${item.key}`}
              accessibilityRole="link"
              accessibilityLabel={item.accessibilityLabel}
              accessibilityState={{ selected: on }}
              onPress={() => router.navigate(item.href)}
              style={({ pressed }) => [styles.item, on && styles.itemActive, pressed && !on && styles.pressed]}
            >
              <Icon name={item.icon} size={22} color={on ? colors.ink : colors.onShellBar} />
              <Txt variant="bodyStrong" color={on ? colors.ink : colors.onShellBar}>
                {item.label}
              </Txt>
            </Pressable>
          );
        })}
      </View>
      {user ? (
        <View style={styles.person} testID="side-nav-person">
          <Txt variant="label" color={colors.onShellBar} numberOfLines={1}>
            {user.displayName}
            {user.callSign ? ` · ${user.callSign}` : ''}
          </Txt>
          <Txt variant="caption" color={colors.onShellBarMuted} numberOfLines={1}>
            {user.email}
          </Txt>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  nav: { width: breakpoints.sideNavPx, backgroundColor: colors.shellBar, paddingVertical: spacing.l, borderRightWidth: 3, borderRightColor: colors.brand },
  brand: { paddingHorizontal: spacing.l, marginBottom: spacing.l },
  club: { paddingHorizontal: spacing.m, marginBottom: spacing.s },
  sync: { paddingHorizontal: spacing.m, marginBottom: spacing.m },
  items: { flex: 1, gap: spacing.xs, paddingHorizontal: spacing.s },
  item: { minHeight: touchTargetPx, flexDirection: 'row', alignItems: 'center', gap: spacing.m, paddingHorizontal: spacing.m, borderRadius: radii.m },
  itemActive: { backgroundColor: colors.brand },
  pressed: { backgroundColor: '#26313C' },
  person: { paddingHorizontal: spacing.l, paddingTop: spacing.m, borderTopWidth: 1, borderTopColor: '#3A4550', marginHorizontal: spacing.s },
});
