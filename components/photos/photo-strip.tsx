import { useMemo, useState } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { colors, spacing } from '@/constants/theme';
import { Button, ErrorText, Txt } from '@/components/ui';
import { useRecords } from '@/hooks/sync';
import type { Photo } from '@/shared/schemas';
import { PhotoThumb } from './photo-thumb';
import { PhotoViewer } from './photo-viewer';
import { type PhotoSubject, useAttachPhoto } from './use-attach-photo';

/**
 * The photos of one record (a support, hazard, operating position or the site), newest first, with buttons to
 * take or choose another. Photos are kept on the phone at once and upload on their own when there is signal.
 */
export function PhotoStrip({ siteId, subjectCollection, subjectId }: PhotoSubject) {
  const all = useRecords('photos') as Photo[] | undefined;
  const photos = useMemo(
    () =>
      (all ?? [])
        .filter((p) => !p.deletedAt && p.subjectId === subjectId && p.subjectCollection === subjectCollection)
        .sort((a, b) => b.takenAt.localeCompare(a.takenAt)),
    [all, subjectId, subjectCollection],
  );
  const { attach, busy, error } = useAttachPhoto();
  const [open, setOpen] = useState<Photo | null>(null);
  const subject = { siteId, subjectCollection, subjectId };
  return (
    <View style={styles.wrap} testID="photo-strip">
      <View style={styles.head}>
        <Txt variant="label">Photos{photos.length ? ` (${photos.length})` : ''}</Txt>
        <View style={styles.actions}>
          <Button label="Take photo" icon="plus" compact busy={busy} onPress={() => void attach(subject, 'camera')} testID="photo-take" accessibilityLabel="Take a photo with the camera" />
          <Button label="Choose" variant="secondary" compact disabled={busy} onPress={() => void attach(subject, 'library')} testID="photo-choose" accessibilityLabel="Choose a photo from this device" />
        </View>
      </View>
      {error ? <ErrorText message={error} testID="photo-error" /> : null}
      {photos.length === 0 ? (
        <Txt variant="caption" color={colors.inkMuted}>
          No photos yet. A photo of the branch or the line helps the lead and the safety officer.
        </Txt>
      ) : (
        <ScrollView horizontal contentContainerStyle={styles.row} showsHorizontalScrollIndicator={false}>
          {photos.map((p) => (
            <PhotoThumb key={p.id} photo={p} onOpen={setOpen} />
          ))}
        </ScrollView>
      )}
      {open ? <PhotoViewer photo={open} onClose={() => setOpen(null)} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.s },
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', flexWrap: 'wrap', gap: spacing.s },
  actions: { flexDirection: 'row', gap: spacing.s },
  row: { gap: spacing.s },
});
