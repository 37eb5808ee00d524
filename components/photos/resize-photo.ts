// Platform split (STYLE habit 9): Metro picks resize-photo.web.ts or resize-photo.native.ts; this file is what
// TypeScript and Node tests resolve.
export { resizePhoto } from './resize-photo.web';
export { MAX_EDGE_PX, fitWithin, type ResizedPhoto } from './resize-photo.types';
