import { useEffect, useState } from 'react';
import * as Location from 'expo-location';

/*
 * Where the scout stands, live: expo-location's position watch (the browser's geolocation on the web).
 * Each reading keeps its reported accuracy (the 68 % radius the device claims) so the fix averaging can
 * weight it, and its own time so the same reading is never counted twice.
 */

export type PositionReading = { lat: number; lon: number; accuracyM: number | null; atMs: number };
export type PositionStatus = 'starting' | 'watching' | 'denied' | 'unavailable';
export type PositionState = { latest: PositionReading | null; status: PositionStatus; message: string | null };

export function usePosition(active = true): PositionState {
  const [state, setState] = useState<PositionState>({ latest: null, status: 'starting', message: null });
  useEffect(() => {
    if (!active) return;
    let cancelled = false;
    let sub: Location.LocationSubscription | null = null;
    (async () => {
      try {
        const perm = await Location.requestForegroundPermissionsAsync();
        if (cancelled) return;
        if (!perm.granted) {
          setState({ latest: null, status: 'denied', message: 'Location is not allowed for Loftline. Allow it in the browser or phone settings, or place things by distance and bearing from a known point.' });
          return;
        }
        sub = await Location.watchPositionAsync(
          { accuracy: Location.Accuracy.BestForNavigation, timeInterval: 1000, distanceInterval: 0 },
          (loc) => {
            if (cancelled) return;
            setState({
              status: 'watching',
              message: null,
              latest: { lat: loc.coords.latitude, lon: loc.coords.longitude, accuracyM: loc.coords.accuracy ?? null, atMs: loc.timestamp || Date.now() },
            });
          },
          (reason) => !cancelled && setState((s) => ({ ...s, status: 'unavailable', message: `No position yet: ${reason}` })),
        );
        if (cancelled) sub.remove();
      } catch (e) {
        if (!cancelled) setState({ latest: null, status: 'unavailable', message: `This device gives no position (${e instanceof Error ? e.message : String(e)}).` });
      }
    })();
    return () => {
      cancelled = true;
      sub?.remove();
    };
  }, [active]);
  return state;
}
