import { useEffect, useSyncExternalStore } from 'react';
import { Platform, StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/constants/theme';
import { Button, Txt } from '@/components/ui';
import { applyUpdate, isUpdateWaiting, registerServiceWorker, subscribeToUpdate } from '@/sync/service-worker';

/**
 * Registers the service worker (web, production builds) and, when a new Loftline has been deployed and
 * downloaded, offers to switch to it. Nothing reloads on its own: a scout halfway through a measurement decides.
 */
export function UpdatePrompt() {
  useEffect(() => {
    if (Platform.OS === 'web') registerServiceWorker();
  }, []);
  const waiting = useSyncExternalStore(subscribeToUpdate, isUpdateWaiting, () => false);
  if (!waiting) return null;
  return (
    <View style={styles.bar} accessibilityRole="alert" testID="update-prompt">
      <Txt variant="bodyStrong" color={colors.onShellBar} style={styles.text}>
        A new Loftline is ready — reload
      </Txt>
      <Button label="Reload" onPress={applyUpdate} testID="update-reload" accessibilityLabel="Reload to use the new version of Loftline" compact />
    </View>
  );
}

const styles = StyleSheet.create({
  bar: {
    position: 'absolute',
    left: spacing.m,
    right: spacing.m,
    bottom: spacing.xxxl + spacing.xl,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.m,
    padding: spacing.m,
    borderRadius: radii.m,
    backgroundColor: colors.shellBar,
    zIndex: 100,
  },
  text: { flex: 1 },
});
