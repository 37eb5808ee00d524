import type { TiltState } from './tilt-types';

/*
 * Native builds have no tilt reading yet: expo-sensors is not part of this app (the web build is what
 * clubs use today), so the height form offers typing the clinometer angles instead. See use-tilt.web.ts.
 */
export function useTilt(): TiltState {
  return { status: 'unsupported', readings: [], start: async () => {}, stop: () => {} };
}
