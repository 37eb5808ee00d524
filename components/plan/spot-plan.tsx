import { useMemo } from 'react';
import { View } from 'react-native';
import { Circle, G, Line, Path } from 'react-native-svg';
import { SitePlan } from '@/components/survey/plan/site-plan';
import { buildFeatures } from '@/components/survey/plan/plan-features';
import { colors } from '@/constants/theme';
import { toLocalEastNorth } from '@/shared/geo';
import type { Candidate } from '@/shared/plan';
import type { SiteRecords } from '@/shared/review';
import { Txt } from '@/components/ui';

/*
 * One or more candidate spots drawn on the survey's site plan (same transforms, same symbols): the wire
 * between its supports, the broadside directions, each support's fall circle (its full height), the
 * exposure distance for the public around the feed point and the coax route to the operating position.
 */
export function SpotPlan({ records, candidates, height = 320, testID }: { records: SiteRecords; candidates: readonly Candidate[]; height?: number; testID: string }) {
  const ref = { lat: records.site.refLat, lon: records.site.refLon };
  const features = useMemo(
    () => buildFeatures(records, (lat, lon) => toLocalEastNorth(ref, { lat, lon })),
    [records, ref.lat, ref.lon],
  );
  const positions = useMemo(() => new Map(features.filter((f) => f.type === 'position').map((f) => [f.id, f.type === 'position' ? f.at : null])), [features]);
  return (
    <View>
      <SitePlan
        features={features}
        me={null}
        selected={null}
        onSelect={() => undefined}
        height={height}
        testID={testID}
        overlay={(toScreen, pxPerM) => (
          <G>
            {candidates.map((c, i) => {
              const colour = i === 0 ? colors.brand : i === 1 ? colors.action : colors.ok;
              const feed = toScreen(c.feed);
              const op = c.coax ? positions.get(c.coax.operatingPositionId) : null;
              const arrow = (deg: number) => {
                const r = (deg * Math.PI) / 180;
                return { x: feed.x + Math.sin(r) * 36, y: feed.y - Math.cos(r) * 36 };
              };
              return (
                <G key={c.id}>
                  {c.footprint.map((s) => {
                    const at = toScreen(s.at);
                    return <Circle key={s.supportId} cx={at.x} cy={at.y} r={s.heightM * pxPerM} fill="none" stroke={colors.danger} strokeWidth={1.5} strokeDasharray="6 4" />;
                  })}
                  <Circle cx={feed.x} cy={feed.y} r={Math.max(2, c.exposure.uncontrolledM * pxPerM)} fill="rgba(122,79,0,0.10)" stroke={colors.warning} strokeWidth={1.5} />
                  {op ? (() => {
                    const o = toScreen(op);
                    return <Line x1={feed.x} y1={feed.y} x2={o.x} y2={o.y} stroke={colors.ink} strokeWidth={2} strokeDasharray="2 4" />;
                  })() : null}
                  {c.wire.map(([a, b], k) => {
                    const p = toScreen(a);
                    const q = toScreen(b);
                    return <Line key={k} x1={p.x} y1={p.y} x2={q.x} y2={q.y} stroke={colour} strokeWidth={4} strokeLinecap="round" />;
                  })}
                  {c.broadsideDeg.map((d) => {
                    const t = arrow(d);
                    return <Path key={d} d={`M${feed.x} ${feed.y} L${t.x} ${t.y}`} stroke={colour} strokeWidth={2} />;
                  })}
                  <Circle cx={feed.x} cy={feed.y} r={5} fill={colour} />
                </G>
              );
            })}
          </G>
        )}
      />
      <Txt variant="caption" color={colors.inkMuted}>
        Thick line: the wire; short lines: broadside; red dashed circles: where each support could fall; shaded circle: keep the public this far from the feed point (RF exposure); dotted line: the coax route.
      </Txt>
    </View>
  );
}
