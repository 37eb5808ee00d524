import { useMemo, useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { Button, ErrorText, Screen, Txt } from '@/components/ui';
import { colors, spacing } from '@/constants/theme';
import { RoleNotice } from '@/components/plan/role-notice';
import { useAssign } from '@/hooks/plan/use-assign';
import { useEventRecords } from '@/hooks/plan/use-event-records';
import { usePlanResult } from '@/hooks/plan/use-plan-result';
import { useSpotReviews } from '@/hooks/plan/use-spot-reviews';
import { useBreakpoint } from '@/hooks/use-breakpoint';
import { useCurrentClub } from '@/hooks/use-current-club';
import { DEFAULT_PURPOSE_BY_BAND, type Candidate } from '@/shared/plan';
import { spotSeparations, type SpotEvaluation } from '@/shared/review';
import { can } from '@/shared/schemas';
import { AssignmentsCard } from './assignments-card';
import { CandidateDetail } from './candidate-detail';
import { CandidatesCard } from './candidates-card';
import { CautionsBox } from './cautions-box';
import { SpotPlan } from './spot-plan';
import { StationsCard } from './stations-card';
import { labelsOf } from './label-ids';

/** The lead's plan for one event: stations and coax, ranked candidates, assignments and their review state. */
export function PlanScreen({ eventId }: { eventId: string }) {
  const { role } = useCurrentClub();
  const { isWide } = useBreakpoint();
  const records = useEventRecords(eventId);
  const reviews = useSpotReviews(records);
  const plan = usePlanResult(reviews?.file ?? null);
  const assign = useAssign(eventId, records?.spots ?? []);
  const [open, setOpen] = useState<Candidate[]>([]);
  const [message, setMessage] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const separations = useMemo(() => (reviews ? spotSeparations(reviews.spots) : []), [reviews]);

  if (records === undefined) return <ActivityIndicator color={colors.action} size="large" style={styles.loading} testID="plan-loading" />;
  if (records === null || !reviews) return <Screen title="Plan"><ErrorText boxed message="This event or its site is not on this device yet. Connect once so it can sync." testID="plan-missing" /></Screen>;
  if (role === 'crew') return <RoleNotice eventId={eventId} />;
  const canPlan = !!role && can(role, 'plan.write');
  const supportLabel = (id: string) => records.supports.find((s) => s.id === id)?.label ?? 'A removed support';
  const stations = records.stations.filter((s) => s.deletedAt === null);
  const purposeOf = (c: Candidate) => stations.find((s) => s.id === c.stationId)?.purpose ?? DEFAULT_PURPOSE_BY_BAND[c.band];
  const run = (p: Promise<unknown>, ok?: string) => p.then(() => { setError(null); if (ok) setMessage(ok); }, (e: Error) => setError(e.message));
  const openCandidate = (c: Candidate, compare: boolean) => setOpen((cur) => (compare ? (cur.some((x) => x.id === c.id) ? cur.filter((x) => x.id !== c.id) : [...cur, c].slice(-3)) : [c]));
  const openSpot = (s: SpotEvaluation) => s.evaluated && setOpen([s.evaluated.candidate]);

  const detail = open.length > 0 && reviews.file ? (
    <View testID="plan-detail">
      <View style={styles.detailHead}>
        <Txt variant="title">{open.length > 1 ? `Comparing ${open.length} spots` : 'Spot'}</Txt>
        <Button label="Close" variant="quiet" compact testID="plan-detail-close" onPress={() => setOpen([])} />
      </View>
      <SpotPlan records={records} candidates={open} testID="plan-spot-plan" height={isWide ? 360 : 300} />
      <View style={[styles.compare, isWide && open.length > 1 && styles.compareWide]}>
        {open.map((c, i) => (
          <View key={c.id} style={isWide && open.length > 1 ? styles.compareCol : undefined}>
            <CandidateDetail
              records={records}
              file={reviews.file!}
              candidate={c}
              purpose={purposeOf(c)}
              supportLabel={supportLabel}
              compact={open.length > 1}
              testID={`plan-candidate-${i}`}
              onAssign={canPlan ? () => run(assign.assignOne(c), `${c.band} assigned. Send it for review when ready.`) : undefined}
              assignLabel={records.spots.some((s) => s.deletedAt === null && s.stationId === c.stationId && s.band === c.band) ? 'Move the assignment here' : 'Assign this spot'}
            />
          </View>
        ))}
      </View>
    </View>
  ) : null;

  return (
    <Screen title="Plan" subtitle={`${records.event.name} · ${records.site.name}`} testID="plan-screen">
      {reviews.notes.length > 0 ? (
        <View style={styles.notes} testID="plan-notes">
          {reviews.notes.map((n) => <Txt key={n} variant="caption">• {n}</Txt>)}
        </View>
      ) : null}
      {error ? <ErrorText boxed message={error} testID="plan-error" /> : null}
      <View style={[styles.columns, isWide && styles.columnsWide]}>
        <View style={isWide ? styles.left : undefined}>
          <AssignmentsCard
            spots={reviews.spots}
            stations={stations}
            separations={separations}
            plan={plan}
            canPlan={canPlan}
            assignMessage={message}
            labels={labelsOf(records.supports, records.hazards, records.operatingPositions, records.stations, records.coax)}
            onAssignAll={() => plan.status === 'done' && run(assign.assignAll(plan.result).then((n) => setMessage(`${n} antenna${n === 1 ? '' : 's'} assigned by the engine. Send each for review when ready.`)))}
            onSendForReview={(spot, fp) => run(assign.sendForReview(spot, fp), 'Sent to the safety officer for review.')}
            onOpen={openSpot}
            onRemove={(spot) => run(assign.remove(spot), 'Assignment removed.')}
          />
          {!isWide ? detail : null}
          {reviews.file ? <CandidatesCard plan={plan} file={reviews.file} stations={stations} supports={records.supports} isWide={isWide} openIds={open.map((c) => c.id)} labels={labelsOf(records.supports, records.hazards)} onOpen={openCandidate} /> : null}
          <StationsCard eventId={eventId} stations={stations} coax={records.coax.filter((c) => c.deletedAt === null)} canPlan={canPlan} />
        </View>
        {isWide ? <View style={[styles.right, open.length > 1 && styles.rightCompare]}>{detail ?? <CautionsBox testID="plan-cautions" />}</View> : null}
      </View>
      {!isWide ? <CautionsBox testID="plan-cautions" /> : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  loading: { marginTop: spacing.xxxl },
  notes: { backgroundColor: colors.infoSoft, borderRadius: 10, padding: spacing.m, marginBottom: spacing.l, gap: spacing.xs },
  columns: { gap: spacing.l },
  columnsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  left: { flex: 5, minWidth: 0 },
  right: { flex: 6, minWidth: 0 },
  // Two or three candidates side by side need the room more than the list beside them does.
  rightCompare: { flex: 7 },
  detailHead: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', marginBottom: spacing.s },
  compare: { gap: spacing.l, marginTop: spacing.m },
  compareWide: { flexDirection: 'row', alignItems: 'flex-start' },
  compareCol: { flex: 1, minWidth: 0 },
});
