import { useMemo, useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { Button, Card, ErrorText, ListRow, NumberField, Select, Txt } from '@/components/ui';
import { colors, spacing } from '@/constants/theme';
import type { PlanState } from '@/hooks/plan/use-plan-result';
import { DEFAULT_PLAN_OPTIONS, evaluateSpot, type Candidate } from '@/shared/plan';
import type { Station, Support } from '@/shared/schemas';
import type { SiteFile } from '@/shared/schemas/site-file';
import { filterCandidates, type CandidateFilter } from './candidate-filters';
import { withLabels } from './label-ids';
import { ClearanceBadge } from './spot-state-badge';
import { legBearingFor, legChoices, legsText, type LegChoice } from './leg-text';

type Props = {
  plan: PlanState;
  file: SiteFile;
  stations: Station[];
  supports: readonly Support[];
  isWide: boolean;
  openIds: string[];
  /** Record labels by id, for the engine's blocking keys ("power-line:<id>"). */
  labels: ReadonlyMap<string, string>;
  onOpen: (c: Candidate, compare: boolean) => void;
};

/** Per station and band: the engine's ranked candidates, filterable, and a spot picked by hand. */
export function CandidatesCard({ plan, file, stations, supports, isWide, openIds, labels, onOpen }: Props) {
  const needs = plan.status === 'done' ? plan.result.antennas : [];
  const [needKey, setNeedKey] = useState<string | null>(null);
  const [filter, setFilter] = useState<CandidateFilter>({ supportId: 'any', level: 'any' });
  const [handShape, setHandShape] = useState<'flat' | 'inverted-v'>('flat');
  const [handA, setHandA] = useState<string | null>(null);
  const [handB, setHandB] = useState<string | null>(null);
  const [handError, setHandError] = useState<string | null>(null);
  const [handLegs, setHandLegs] = useState<LegChoice>('best');
  const [handTyped, setHandTyped] = useState<number | null>(null);
  const [legsError, setLegsError] = useState<string | null>(null);
  const chosen = needs.find((n) => n.need.key === needKey) ?? needs[0];
  const list = useMemo(() => (chosen ? filterCandidates(chosen.ranked, filter) : []), [chosen, filter]);
  const stationName = (id: string) => stations.find((s) => s.id === id)?.name ?? id;
  const planned = supports.filter((s) => s.deletedAt === null && s.heightM !== null);
  const label = (id: string) => supports.find((s) => s.id === id)?.label ?? id;

  const pickByHand = () => {
    if (!chosen || !handA || (handShape === 'flat' && (!handB || handB === handA))) return setHandError('Choose the support (two different supports for a flat-top).');
    const legs = handShape === 'inverted-v' ? legBearingFor(handLegs, handTyped) : { bearingDeg: null, error: null };
    setLegsError(legs.error);
    if (legs.error) return setHandError(null);
    const e = evaluateSpot(file, {
      stationId: chosen.need.stationId,
      band: chosen.need.band,
      shape: handShape,
      supportIds: handShape === 'flat' ? [handA, handB!] : [handA],
      legAzimuthDeg: legs.bearingDeg,
    });
    if (!e) return setHandError(`A ${chosen.need.band} ${handShape === 'flat' ? 'flat-top cannot span these supports (too close, too far, or the wire would hang too low)' : 'inverted-V cannot hang from this support (its ends would be too low)'}.`);
    setHandError(null);
    onOpen(e.candidate, false);
  };

  if (plan.status === 'idle') return <Card title="Candidates" testID="plan-candidates"><Txt color={colors.inkMuted}>Add a station to see where its antennas could go.</Txt></Card>;
  if (plan.status === 'computing') {
    return (
      <Card title="Candidates" testID="plan-candidates">
        <View style={styles.line} testID="plan-computing">
          <ActivityIndicator color={colors.action} />
          <Txt>Computing the candidates for every station and band…</Txt>
        </View>
      </Card>
    );
  }
  if (plan.status === 'failed') return <Card title="Candidates" testID="plan-candidates"><ErrorText boxed message={`The plan could not be computed: ${plan.message}`} testID="plan-failed" /></Card>;
  return (
    <Card title="Candidates" testID="plan-candidates">
      <Select label="Station and band" testID="candidates-need" options={needs.map((n) => ({ value: n.need.key, label: `${stationName(n.need.stationId)} ${n.need.band}` }))} value={chosen?.need.key} onChange={setNeedKey} />
      <Select
        label="Clearance"
        testID="candidates-level"
        options={[{ value: 'any', label: 'Any' }, { value: 'clear', label: 'Clear' }, { value: 'needs-review', label: 'Needs review' }, { value: 'blocked', label: 'Blocked' }] as const}
        value={filter.level}
        onChange={(level) => setFilter((f) => ({ ...f, level }))}
      />
      <Select label="Support" testID="candidates-support" options={[{ value: 'any', label: 'Any' }, ...planned.map((s) => ({ value: s.id, label: s.label }))]} value={filter.supportId} onChange={(supportId) => setFilter((f) => ({ ...f, supportId }))} />
      {plan.computedIn === 'main-thread' ? (
        <Txt variant="caption" testID="plan-main-thread">Planning in this screen, not in the background: this browser could not start the background planner, so the screen may pause for a moment while a plan is worked out.</Txt>
      ) : null}
      {chosen ? <Txt variant="caption" color={colors.inkMuted}>{chosen.usableCount} usable of {chosen.candidateCount} possible spots; {chosen.blockedCount} blocked{chosen.blockedBy.length ? ` (by ${chosen.blockedBy.map((b) => `${withLabels(b.key.replace(/^power-line:/, 'the power line '), labels)} ×${b.count}`).join(', ')})` : ''}.</Txt> : null}
      {list.length === 0 ? <Txt testID="candidates-none">No candidate passes these filters.</Txt> : null}
      {list.map((c, i) => (
        <View key={c.id}>
          <ListRow
            title={`${i + 1}. ${c.shape === 'flat' ? `${label(c.supportIds[0])} – ${label(c.supportIds[1])}` : `Inverted-V at ${label(c.supportIds[0])}, ${legsText(c.wireAzimuthDeg)}`}`}
            subtitle={c.summary}
            testID={`candidate-${i}`}
            selected={openIds.includes(c.id)}
            onPress={() => onOpen(c, false)}
          />
          {/* The badge and the compare button sit under the row, so its title and summary keep the full width. */}
          <View style={styles.rowFoot}>
            <ClearanceBadge level={c.level} testID={`candidate-level-${i}`} />
            {isWide ? <Button label={openIds.includes(c.id) ? 'Shown' : 'Compare'} variant="secondary" compact testID={`candidate-compare-${i}`} onPress={() => onOpen(c, true)} /> : null}
          </View>
        </View>
      ))}
      <View style={styles.hand} testID="candidates-by-hand">
        <Txt variant="label">Or choose a spot by hand</Txt>
        <Select label="Shape" testID="hand-shape" options={[{ value: 'flat', label: 'Flat-top (two supports)' }, { value: 'inverted-v', label: 'Inverted-V (one support)' }] as const} value={handShape} onChange={setHandShape} />
        <Select label={handShape === 'flat' ? 'First support' : 'Support'} testID="hand-a" options={planned.map((s) => ({ value: s.id, label: s.label }))} value={handA} onChange={setHandA} />
        {handShape === 'flat' ? <Select label="Second support" testID="hand-b" options={planned.map((s) => ({ value: s.id, label: s.label }))} value={handB} onChange={setHandB} /> : null}
        {handShape === 'inverted-v' ? (
          <>
            <Select label="Leg direction (bearings true from the apex)" testID="hand-legs" options={legChoices(DEFAULT_PLAN_OPTIONS.invertedVAzimuthsDeg)} value={handLegs} onChange={(v) => { setHandLegs(v); setLegsError(null); }} />
            {handLegs === 'typed' ? (
              <NumberField label="Leg bearing, 0 to 179.9° true (legs to 30° and 210°: type 30)" testID="hand-legs-typed" value={handTyped} onChange={(v) => { setHandTyped(v); setLegsError(null); }} error={legsError ?? undefined} />
            ) : legsError ? <ErrorText message={legsError} testID="hand-legs-error" /> : null}
          </>
        ) : null}
        {handError ? <ErrorText message={handError} testID="hand-error" /> : null}
        <Button label="Check this spot" variant="secondary" testID="hand-check" onPress={pickByHand} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  line: { flexDirection: 'row', alignItems: 'center', gap: spacing.s },
  rowFoot: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: spacing.s, paddingHorizontal: spacing.m, paddingVertical: spacing.xs },
  hand: { marginTop: spacing.l, gap: spacing.s },
});
