import { ActivityIndicator, Image, Modal, StyleSheet, View } from 'react-native';
import { colors, spacing } from '@/constants/theme';
import { Button, Txt } from '@/components/ui';
import type { Photo } from '@/shared/schemas';
import { usePhotoImage, usePhotoWaiting } from './use-photo-image';

/** A photo full size, over everything, with when it was taken and whether it has reached the server. */
export function PhotoViewer({ photo, onClose }: { photo: Photo; onClose: () => void }) {
  const image = usePhotoImage(photo.sha256, photo.mimeType);
  const waiting = usePhotoWaiting(photo.sha256);
  const taken = new Date(photo.takenAt).toLocaleString();
  return (
    <Modal visible transparent animationType="fade" onRequestClose={onClose}>
      <View style={styles.backdrop} testID="photo-viewer">
        <View style={styles.frame}>
          {image.state === 'ready' ? (
            <Image source={{ uri: image.uri }} style={styles.image} resizeMode="contain" accessibilityLabel={photo.caption || 'Photo'} testID="photo-viewer-image" />
          ) : image.state === 'loading' ? (
            <ActivityIndicator size="large" color={colors.onShellBar} />
          ) : (
            <Txt color={colors.onShellBar} align="center">
              {image.state === 'elsewhere'
                ? 'This photo is still on the phone that took it; it shows here once that phone uploads it.'
                : image.state === 'offline'
                  ? 'This photo is not on this device. It shows when you are back online.'
                  : `The photo could not be loaded: ${image.message}`}
            </Txt>
          )}
        </View>
        <View style={styles.footer}>
          <Txt variant="caption" color={colors.onShellBar} style={styles.meta}>
            {photo.caption ? `${photo.caption} · ` : ''}Taken {taken}
            {waiting ? ' · waiting to upload from this device' : ''}
          </Txt>
          <Button label="Close" onPress={onClose} testID="photo-viewer-close" variant="secondary" compact />
        </View>
      </View>
    </Modal>
  );
}

const styles = StyleSheet.create({
  backdrop: { flex: 1, backgroundColor: colors.shellBar, padding: spacing.m, gap: spacing.m },
  frame: { flex: 1, alignItems: 'center', justifyContent: 'center' },
  image: { width: '100%', height: '100%' },
  footer: { flexDirection: 'row', alignItems: 'center', gap: spacing.m },
  meta: { flex: 1 },
});
