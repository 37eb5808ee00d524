import { useEffect, useMemo, useRef } from 'react';
import { PanResponder, Platform, type GestureResponderEvent, type View } from 'react-native';
import { panBy, pinchStep, wheelZoomFactor, zoomAbout, type PinchState, type PlanSize, type PlanView, type ScreenPoint } from '@/components/survey/plan/plan-transform';

/*
 * Pan with one finger or the mouse, pinch with two fingers, zoom with the mouse wheel about the pointer,
 * and a short still touch is a tap (which the plan turns into "open this record"). The maths is in
 * plan-transform.ts; this hook only turns touch and wheel events into its inputs.
 */

type Options = {
  containerRef: React.RefObject<View | null>;
  size: PlanSize;
  view: PlanView | null;
  onView: (v: PlanView) => void;
  onTap: (at: ScreenPoint) => void;
};

const TAP_SLOP_PX = 8;

/** The container's top-left corner in page coordinates (the DOM knows it exactly on the web). */
function originOf(ref: React.RefObject<View | null>): ScreenPoint {
  const node = ref.current as unknown as { getBoundingClientRect?: () => { left: number; top: number } } | null;
  if (Platform.OS === 'web' && node?.getBoundingClientRect) {
    const r = node.getBoundingClientRect();
    const page = globalThis as { scrollX?: number; scrollY?: number };
    return { x: r.left + (page.scrollX ?? 0), y: r.top + (page.scrollY ?? 0) };
  }
  return { x: 0, y: 0 };
}

function touchesOf(e: GestureResponderEvent, origin: ScreenPoint): ScreenPoint[] {
  const ts = e.nativeEvent.touches?.length ? e.nativeEvent.touches : [e.nativeEvent];
  return Array.from(ts).map((t) =>
    Platform.OS === 'web' ? { x: t.pageX - origin.x, y: t.pageY - origin.y } : { x: t.locationX, y: t.locationY },
  );
}

function pinchOf(pts: ScreenPoint[]): PinchState {
  const [a, b] = pts;
  return { distancePx: Math.hypot(b.x - a.x, b.y - a.y), centre: { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 } };
}

export function usePlanGestures({ containerRef, size, view, onView, onTap }: Options) {
  // The responder is made once; it reads the latest props through this ref.
  const latest = useRef({ size, view, onView, onTap });
  latest.current = { size, view, onView, onTap };
  const g = useRef({ origin: { x: 0, y: 0 }, start: { x: 0, y: 0 }, last: { x: 0, y: 0 }, pinch: null as PinchState | null, moved: false, startedAt: 0 });

  const responder = useMemo(
    () =>
      PanResponder.create({
        onStartShouldSetPanResponder: () => true,
        onMoveShouldSetPanResponder: () => true,
        onPanResponderTerminationRequest: () => false,
        onPanResponderGrant: (e) => {
          const origin = originOf(containerRef);
          const pts = touchesOf(e, origin);
          g.current = { origin, start: pts[0], last: pts[0], pinch: pts.length >= 2 ? pinchOf(pts) : null, moved: false, startedAt: Date.now() };
        },
        onPanResponderMove: (e) => {
          const { view: v, size: s, onView: set } = latest.current;
          if (!v) return;
          const pts = touchesOf(e, g.current.origin);
          if (pts.length >= 2) {
            const next = pinchOf(pts);
            if (g.current.pinch) set(pinchStep(v, s, g.current.pinch, next));
            g.current.pinch = next;
            g.current.moved = true;
            g.current.last = pts[0];
            return;
          }
          g.current.pinch = null;
          const p = pts[0];
          if (Math.hypot(p.x - g.current.start.x, p.y - g.current.start.y) > TAP_SLOP_PX) g.current.moved = true;
          if (g.current.moved) set(panBy(v, p.x - g.current.last.x, p.y - g.current.last.y));
          g.current.last = p;
        },
        onPanResponderRelease: () => {
          if (!g.current.moved && Date.now() - g.current.startedAt < 700) latest.current.onTap(g.current.start);
        },
      }),
    [containerRef],
  );

  useEffect(() => {
    if (Platform.OS !== 'web') return;
    const node = containerRef.current as unknown as HTMLElement | null;
    if (!node?.addEventListener) return;
    const onWheel = (ev: WheelEvent) => {
      const { view: v, size: s, onView: set } = latest.current;
      if (!v) return;
      // Without preventDefault the page would scroll as well as the plan zooming.
      ev.preventDefault();
      const r = node.getBoundingClientRect();
      set(zoomAbout(v, s, { x: ev.clientX - r.left, y: ev.clientY - r.top }, wheelZoomFactor(ev.deltaY)));
    };
    node.addEventListener('wheel', onWheel, { passive: false });
    return () => node.removeEventListener('wheel', onWheel);
  }, [containerRef]);

  return responder.panHandlers;
}
