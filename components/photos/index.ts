export { PhotoStrip } from './photo-strip';
export { PhotoThumb } from './photo-thumb';
export { PhotoViewer } from './photo-viewer';
export { useAttachPhoto, type AttachPhoto, type PhotoSource, type PhotoSubject } from './use-attach-photo';
export { usePendingPhotos, usePhotoQueue, usePhotoQueueStatus } from './use-photo-queue';
export { usePhotoImage, usePhotoWaiting, type PhotoImage } from './use-photo-image';
