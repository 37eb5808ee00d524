import { Redirect, usePathname } from 'expo-router';
import { useMemo } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { colors, spacing } from '@/constants/theme';
import { useEvents } from '@/hooks/api/use-events';
import { useMe } from '@/hooks/api/use-me';
import { useSession } from '@/hooks/auth/use-session';
import { useBreakpoint } from '@/hooks/use-breakpoint';
import { CurrentClubProvider, useCurrentClub } from '@/hooks/use-current-club';
import { ErrorText, Screen } from '@/components/ui';
import { errorMessage } from '@/hooks/api/client';
import { BottomBar } from './bottom-bar';
import { SideNav } from './side-nav';
import { BrandMark } from './brand-mark';
import { ClubSwitcher } from './club-switcher';
import { localTodayIso, pickFocusEvent } from './focus-event';
import { activeNavKey, navItemsFor } from './nav-items';
import { NoClubScreen } from './no-club-screen';
import { HAS_SYNC_INDICATOR, SyncIndicatorSlot, SyncProviderSlot } from './sync-slot';

/** Paths a person without any club may still open. */
const CLUBLESS_PATHS = ['/club/new', '/settings'];

/** The signed-in shell: session guard, current club, navigation for the role, and the sync mount point. */
export function AppShell({ children }: { children: React.ReactNode }) {
  const { tokens } = useSession();
  const pathname = usePathname();
  if (!tokens) return <Redirect href={`/sign-in${pathname && pathname !== '/' ? `?next=${encodeURIComponent(pathname)}` : ''}`} />;
  return (
    <CurrentClubProvider>
      <ShellFrame>{children}</ShellFrame>
    </CurrentClubProvider>
  );
}

function ShellFrame({ children }: { children: React.ReactNode }) {
  const me = useMe();
  const { club, role } = useCurrentClub();
  const { isWide } = useBreakpoint();
  const insets = useSafeAreaInsets();
  const pathname = usePathname();
  const events = useEvents(club?.id);
  const focus = useMemo(() => pickFocusEvent(events.data ?? [], localTodayIso()), [events.data]);
  const items = role ? navItemsFor(role, focus?.id ?? null) : [];
  const active = activeNavKey(pathname);

  if (me.isLoading) {
    return (
      <View style={styles.center} accessibilityLabel="Loading your clubs">
        <ActivityIndicator size="large" color={colors.action} />
      </View>
    );
  }
  // A failed refresh with a kept answer (offline) is not an error worth a screen: carry on with what is known.
  if (me.isError && !me.data) {
    return (
      <Screen title="Loftline" narrow>
        <ErrorText boxed message={errorMessage(me.error)} testID="shell-error" />
      </Screen>
    );
  }
  const body = !club && !CLUBLESS_PATHS.includes(pathname) ? <NoClubScreen /> : children;

  return (
    <SyncProviderSlot clubId={club?.id ?? null}>
      <View style={[styles.root, isWide && styles.row]}>
        {isWide ? (
          items.length > 0 ? <SideNav items={items} active={active} /> : null
        ) : (
          <View style={[styles.header, { paddingTop: insets.top + spacing.s }]} testID="phone-header">
            <View style={styles.headerRow}>
              {/* On a phone the mark alone leaves the club's name room to be read. */}
              <BrandMark onDark markOnly={!!club} />
              <View style={styles.headerClub}>
                <ClubSwitcher onDark />
              </View>
            </View>
            {HAS_SYNC_INDICATOR && club ? (
              <View style={styles.headerSync}>
                <SyncIndicatorSlot />
              </View>
            ) : null}
          </View>
        )}
        <View style={styles.main} role="main">
          {body}
        </View>
        {!isWide && items.length > 0 ? <BottomBar items={items} active={active} /> : null}
      </View>
    </SyncProviderSlot>
  );
}


const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.paper },
  row: { flexDirection: 'row' },
  center: { flex: 1, alignItems: 'center', justifyContent: 'center', backgroundColor: colors.paper },
  header: { backgroundColor: colors.shellBar, paddingHorizontal: spacing.l, paddingBottom: spacing.s, gap: spacing.s },
  headerRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.m },
  headerClub: { flex: 1, alignItems: 'flex-end' },
  headerSync: { alignItems: 'flex-start' },
  main: { flex: 1 },
});
