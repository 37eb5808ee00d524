import * as Location from 'expo-location';
import { useCallback, useState } from 'react';

export type Fix = { lat: number; lon: number; accuracyM: number | null };

/** One position fix from the device (the browser's geolocation on the web), with plain-words failures. */
export function useMyPosition() {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const locate = useCallback(async (): Promise<Fix | null> => {
    setBusy(true);
    setError(null);
    try {
      const perm = await Location.requestForegroundPermissionsAsync();
      if (perm.status !== 'granted') {
        setError('Loftline may not read your position. Allow location for this site in the browser, or type the numbers.');
        return null;
      }
      const pos = await Location.getCurrentPositionAsync({ accuracy: Location.Accuracy.High });
      return { lat: pos.coords.latitude, lon: pos.coords.longitude, accuracyM: pos.coords.accuracy ?? null };
    } catch {
      setError('No position came back. Step outside, wait for the GPS, or type the numbers.');
      return null;
    } finally {
      setBusy(false);
    }
  }, []);
  return { locate, busy, error };
}
