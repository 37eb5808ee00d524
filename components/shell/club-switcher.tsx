import { useRouter } from 'expo-router';
import { useState } from 'react';
import { Modal, Pressable, StyleSheet, View } from 'react-native';
import { colors, radii, spacing, touchTargetPx } from '@/constants/theme';
import { Button, Icon, ListRow, Txt } from '@/components/ui';
import { useCurrentClub } from '@/hooks/use-current-club';
import { ROLE_LABELS } from '@/shared/schemas';

/** The current club and the person's role in it; opens a chooser when they belong to several. */
export function ClubSwitcher({ onDark }: { onDark?: boolean }) {
  const { club, clubs, setClubId } = useCurrentClub();
  const router = useRouter();
  const [open, setOpen] = useState(false);
  if (!club) return null;
  const fg = onDark ? colors.onShellBar : colors.ink;
  const fgMuted = onDark ? colors.onShellBarMuted : colors.inkMuted;
  return (
    <>
      <Pressable
        testID="club-switcher"
        accessibilityRole="button"
        accessibilityLabel={`Club: ${club.name}, your role: ${ROLE_LABELS[club.role]}. Change club`}
        onPress={() => setOpen(true)}
        style={({ pressed }) => [styles.button, onDark && styles.buttonDark, pressed && styles.pressed]}
      >
        <View style={styles.names}>
          <Txt variant="label" color={fg} numberOfLines={1}>
            {club.name}
          </Txt>
          <Txt variant="caption" color={fgMuted} numberOfLines={1} testID="current-role">
            {club.callSign ? `${club.callSign} · ` : ''}
            {ROLE_LABELS[club.role]}
          </Txt>
        </View>
        <Icon name="chevron-down" size={18} color={fg} />
      </Pressable>
      <Modal visible={open} transparent animationType="fade" onRequestClose={() => setOpen(false)}>
        <Pressable style={styles.backdrop} onPress={() => setOpen(false)} accessibilityLabel="Close the club list" testID="club-switcher-backdrop">
          <Pressable style={styles.sheet} onPress={() => undefined} accessibilityLabel="Your clubs" testID="club-switcher-sheet">
            <Txt variant="title" style={styles.sheetTitle} accessibilityRole="header">
              Your clubs
            </Txt>
            {clubs.map((c) => (
              <ListRow
                key={c.id}
                testID={`club-option-${c.id}`}
                title={c.name}
                subtitle={`${c.callSign ? `${c.callSign} · ` : ''}${ROLE_LABELS[c.role]}`}
                icon={c.id === club.id ? 'check-circle' : 'people'}
                selected={c.id === club.id}
                onPress={() => {
                  setClubId(c.id);
                  setOpen(false);
                  router.navigate('/events');
                }}
              />
            ))}
            <View style={styles.actions}>
              <Button
                label="Start a new club"
                icon="plus"
                variant="secondary"
                testID="club-switcher-create"
                onPress={() => {
                  setOpen(false);
                  router.navigate('/club/new');
                }}
              />
              <Button label="Close" variant="quiet" testID="club-switcher-close" onPress={() => setOpen(false)} />
            </View>
          </Pressable>
        </Pressable>
      </Modal>
    </>
  );
}

const styles = StyleSheet.create({
  button: {
    minHeight: touchTargetPx,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.s,
    paddingHorizontal: spacing.m,
    borderRadius: radii.m,
    borderWidth: 1.5,
    borderColor: colors.line,
    flexShrink: 1,
  },
  buttonDark: { borderColor: '#5A6570' },
  pressed: { opacity: 0.8 },
  names: { flexShrink: 1 },
  backdrop: { flex: 1, backgroundColor: 'rgba(20,28,36,0.55)', justifyContent: 'center', alignItems: 'center', padding: spacing.l },
  sheet: { width: '100%', maxWidth: 480, backgroundColor: colors.surface, borderRadius: radii.l, overflow: 'hidden', paddingBottom: spacing.m },
  sheetTitle: { padding: spacing.l },
  actions: { padding: spacing.l, gap: spacing.s },
});
