/*
 * Photos on the device and their upload (no React). The app keeps one PhotoQueue per club; `useSyncStatus`'s
 * pendingPhotos is `queue.getStatus().waiting`.
 */
export { openIdbPhotoStore, idbPhotoDatabaseName } from './idb-photo-store';
export { createMemoryPhotoStore, MemoryPhotoDatabase } from './memory-photo-store';
export { httpPhotoApi, PhotoApiError, type PhotoApi, type PhotoRequest } from './photo-api';
export { uploadPhoto, type UploadOutcome } from './photo-uploader';
export { PhotoQueue, type PhotoQueueOptions, type PhotoQueueStatus } from './photo-queue';
export { sha256Hex } from './sha256';
export { loadPhotoBytes } from './photo-bytes';
export type { NewPhoto, PhotoStore, QueuedPhoto, PhotoState } from './types';
export { browserTriggerEnv } from './triggers';
