import { useRouter } from 'expo-router';
import { useState } from 'react';
import { Modal, Pressable, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { colors, radii, spacing, touchTargetPx } from '@/constants/theme';
import { Icon, ListRow, Txt } from '@/components/ui';
import type { NavItem, NavKey } from './nav-items';
import { splitForBar } from './nav-items';

/** The phone's bottom bar: big targets, icon and word for each place, "More" for the rest. */
export function BottomBar({ items, active }: { items: NavItem[]; active: NavKey | null }) {
  const router = useRouter();
  const insets = useSafeAreaInsets();
  const [moreOpen, setMoreOpen] = useState(false);
  const { bar, more } = splitForBar(items);
  const moreActive = more.some((i) => i.key === active);
  return (
    <View style={[styles.bar, { paddingBottom: Math.max(insets.bottom, spacing.xs) }]} accessibilityRole="tablist" testID="bottom-bar">
      {bar.map((item) => (
        <BarButton key={item.key} label={item.label} icon={item.icon} active={item.key === active} testID={`nav-${item.key}`} a11y={item.accessibilityLabel} onPress={() => router.navigate(item.href)} />
      ))}
      {more.length > 0 ? (
        <BarButton label="More" icon="more" active={moreActive} testID="nav-more" a11y="More places" onPress={() => setMoreOpen(true)} />
      ) : null}
      <Modal visible={moreOpen} transparent animationType="slide" onRequestClose={() => setMoreOpen(false)}>
        <Pressable style={styles.backdrop} onPress={() => setMoreOpen(false)} accessibilityLabel="Close More" testID="nav-more-backdrop">
          <View style={[styles.sheet, { paddingBottom: insets.bottom + spacing.m }]} testID="nav-more-sheet">
            <Txt variant="title" style={styles.sheetTitle} accessibilityRole="header">
              More
            </Txt>
            {more.map((item) => (
              <ListRow
                key={item.key}
                testID={`nav-${item.key}`}
                title={item.label}
                icon={item.icon}
                accessibilityLabel={item.accessibilityLabel}
                selected={item.key === active}
                onPress={() => {
                  setMoreOpen(false);
                  router.navigate(item.href);
                }}
              />
            ))}
          </View>
        </Pressable>
      </Modal>
    </View>
  );
}

function BarButton(p: { label: string; icon: NavItem['icon']; active: boolean; testID: string; a11y: string; onPress: () => void }) {
  const fg = p.active ? colors.ink : colors.onShellBar;
  return (
    <Pressable
      testID={p.testID}
      accessibilityRole="tab"
      accessibilityLabel={p.a11y}
      accessibilityState={{ selected: p.active }}
      onPress={p.onPress}
      style={({ pressed }) => [styles.item, pressed && styles.pressed]}
    >
      <View style={[styles.pill, p.active && styles.pillActive]}>
        <Icon name={p.icon} size={24} color={fg} />
      </View>
      <Txt variant="caption" color={p.active ? colors.onShellBar : colors.onShellBarMuted} style={[styles.label, p.active && styles.labelActive]}>
        {p.label}
      </Txt>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  bar: { flexDirection: 'row', backgroundColor: colors.shellBar, paddingTop: spacing.xs, borderTopWidth: 3, borderTopColor: colors.brand },
  item: { flex: 1, alignItems: 'center', justifyContent: 'center', minHeight: touchTargetPx + 12, gap: 2 },
  pressed: { opacity: 0.75 },
  pill: { paddingHorizontal: spacing.m, paddingVertical: 3, borderRadius: radii.pill },
  pillActive: { backgroundColor: colors.brand },
  label: { fontSize: 13, lineHeight: 16 },
  labelActive: { fontFamily: 'Inter_700Bold' },
  backdrop: { flex: 1, backgroundColor: 'rgba(20,28,36,0.55)', justifyContent: 'flex-end' },
  sheet: { backgroundColor: colors.surface, borderTopLeftRadius: radii.l, borderTopRightRadius: radii.l, overflow: 'hidden' },
  sheetTitle: { padding: spacing.l },
});
