import { useCallback, useEffect, useRef, useState } from 'react';
import { elevationFromBetaDeg, type TiltReading } from '@/components/survey/clinometer/tilt-angle';
import type { TiltState } from './tilt-types';

type OrientationCtor = { requestPermission?: () => Promise<'granted' | 'denied'> };

/*
 * The phone's tilt through the browser's DeviceOrientationEvent (W3C DeviceOrientation spec). Safari on
 * iOS only reports after DeviceOrientationEvent.requestPermission() is called from a tap, so start() must
 * be called from a button press. A desktop browser has the event type but never fires it: the form says
 * so when no reading arrives.
 */
export function useTilt(): TiltState {
  const ctor = typeof window !== 'undefined' ? (window as unknown as { DeviceOrientationEvent?: OrientationCtor }).DeviceOrientationEvent : undefined;
  const [status, setStatus] = useState<TiltState['status']>(!ctor ? 'unsupported' : typeof ctor.requestPermission === 'function' ? 'needs-permission' : 'idle');
  const [readings, setReadings] = useState<TiltReading[]>([]);
  const listener = useRef<((e: DeviceOrientationEvent) => void) | null>(null);

  const stop = useCallback(() => {
    if (listener.current) window.removeEventListener('deviceorientation', listener.current);
    listener.current = null;
    setStatus((s) => (s === 'reading' ? 'idle' : s));
  }, []);

  const start = useCallback(async () => {
    if (!ctor) return;
    if (typeof ctor.requestPermission === 'function') {
      const answer = await ctor.requestPermission().catch(() => 'denied' as const);
      if (answer !== 'granted') { setStatus('denied'); return; }
    }
    stop();
    const onOrientation = (e: DeviceOrientationEvent) => {
      if (e.beta === null || e.beta === undefined) return;
      const reading = { elevationDeg: elevationFromBetaDeg(e.beta), atMs: Date.now() };
      // Keep two seconds of readings: enough for the steadiness check, never a growing list.
      setReadings((rs) => [...rs.filter((r) => reading.atMs - r.atMs < 2000), reading]);
    };
    listener.current = onOrientation;
    window.addEventListener('deviceorientation', onOrientation);
    setReadings([]);
    setStatus('reading');
  }, [ctor, stop]);

  useEffect(() => stop, [stop]);
  return { status, readings, start, stop };
}
