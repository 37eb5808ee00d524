import { ActivityIndicator, Image, Pressable, StyleSheet, View } from 'react-native';
import { SYNC_STATE_LOOK } from '@/constants/states';
import { colors, radii, spacing } from '@/constants/theme';
import { Icon, Txt } from '@/components/ui';
import type { Photo } from '@/shared/schemas';
import { usePhotoImage, usePhotoWaiting } from './use-photo-image';

export const THUMB_PX = 96;

/** One photo on a record: the picture, and "Waiting to upload" while the server does not have it yet. */
export function PhotoThumb({ photo, onOpen }: { photo: Photo; onOpen: (photo: Photo) => void }) {
  const image = usePhotoImage(photo.sha256, photo.mimeType);
  const waiting = usePhotoWaiting(photo.sha256);
  const label = `${photo.caption || 'Photo'}${waiting ? ', waiting to upload' : ''}. Open full size.`;
  return (
    <Pressable onPress={() => onOpen(photo)} accessibilityRole="imagebutton" accessibilityLabel={label} testID={`photo-thumb-${photo.id}`} style={styles.thumb}>
      {image.state === 'ready' ? (
        <Image source={{ uri: image.uri }} style={styles.image} resizeMode="cover" accessibilityIgnoresInvertColors />
      ) : image.state === 'loading' ? (
        <ActivityIndicator color={colors.action} />
      ) : (
        <View style={styles.placeholder}>
          <Icon name="cloud-up" size={20} color={colors.inkMuted} />
          <Txt variant="caption" color={colors.inkMuted} align="center">
            {image.state === 'elsewhere' ? 'On another phone' : image.state === 'offline' ? 'Shows online' : 'Not loaded'}
          </Txt>
        </View>
      )}
      {waiting ? (
        <View style={styles.waiting} testID={`photo-waiting-${photo.id}`}>
          <Icon name={SYNC_STATE_LOOK.pending.icon} size={14} color={SYNC_STATE_LOOK.pending.fg} />
          <Txt variant="caption" color={SYNC_STATE_LOOK.pending.fg} style={styles.waitingText}>
            Waiting to upload
          </Txt>
        </View>
      ) : null}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  thumb: {
    width: THUMB_PX,
    height: THUMB_PX,
    borderRadius: radii.s,
    borderWidth: 1.5,
    borderColor: colors.line,
    backgroundColor: colors.surfaceSunk,
    overflow: 'hidden',
    alignItems: 'center',
    justifyContent: 'center',
  },
  image: { width: '100%', height: '100%' },
  placeholder: { alignItems: 'center', gap: spacing.xxs, padding: spacing.xs },
  waiting: {
    position: 'absolute',
    left: 0,
    right: 0,
    bottom: 0,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.xxs,
    paddingHorizontal: spacing.xs,
    backgroundColor: SYNC_STATE_LOOK.pending.bg,
  },
  waitingText: { fontSize: 12, lineHeight: 16 },
});
