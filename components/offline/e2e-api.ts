import type { CollectionName } from '../../shared/schemas';

/*
 * What the test-build hook (e2e-hooks.tsx) puts on window.__loftlineE2E, shared with tests/e2e/offline-*.
 * Plain types only (relative import), so the browser tests can type-check against it.
 */
export interface LoftlineE2E {
  create(collection: CollectionName, fields: Record<string, unknown>): Promise<string>;
  update(collection: CollectionName, id: string, fields: Record<string, unknown>): Promise<void>;
  /** Attaches a photo given as base64 bytes; resolves to the photos record id. */
  attachPhoto(
    subject: { siteId: string; subjectCollection: 'supports' | 'hazards' | 'operatingPositions' | 'sites'; subjectId: string },
    base64: string,
    mimeType: 'image/jpeg' | 'image/png',
  ): Promise<string>;
  records(collection: CollectionName): unknown[];
  status(): unknown;
  photosWaiting(): Promise<number>;
}

declare global {
  // eslint-disable-next-line no-var
  var __loftlineE2E: LoftlineE2E | undefined;
}
