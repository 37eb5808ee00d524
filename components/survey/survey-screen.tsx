import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { ActivityIndicator, ScrollView, StyleSheet, View, useWindowDimensions } from 'react-native';
import { Button, EmptyState, Txt } from '@/components/ui';
import { colors, radii, spacing } from '@/constants/theme';
import { SurveyUndoProvider, useSurveyWrites } from '@/hooks/survey/use-survey-undo';
import { usePosition } from '@/hooks/survey/use-position';
import { useSurveyData } from '@/hooks/survey/use-survey-data';
import { useBreakpoint } from '@/hooks/use-breakpoint';
import { useCurrentClub } from '@/hooks/use-current-club';
import { can } from '@/shared/schemas';
import { SAFETY_CAUTION } from '@/shared/clearance/cautions';
import type { LatLon } from '@/shared/schemas';
import { GroundForm } from './forms/ground-form';
import { HazardForm } from './forms/hazard-form';
import { PositionForm } from './forms/position-form';
import { SiteNotesForm } from './forms/site-notes-form';
import { SupportForm } from './forms/support-form';
import { SiteSummary } from './records/site-summary';
import { RecordDetail } from './records/record-detail';
import { RecordList } from './records/record-list';
import { SitePlan } from './plan/site-plan';
import type { FeatureRef } from './plan/plan-features';
import { SurveyAddMenu } from './survey-add-menu';
import type { SurveyPanel } from './survey-panel';

/** The scout's walk: the site plan, what has been recorded, and the forms to record more. */
export function SurveyScreen({ siteId }: { siteId: string }) {
  return (
    <SurveyUndoProvider>
      <SurveyBody siteId={siteId} />
    </SurveyUndoProvider>
  );
}

function SurveyBody({ siteId }: { siteId: string }) {
  const data = useSurveyData(siteId);
  const position = usePosition();
  const writes = useSurveyWrites();
  const { isWide } = useBreakpoint();
  const { height: windowHeight } = useWindowDimensions();
  const [panel, setPanel] = useState<SurveyPanel>({ type: 'list' });
  const [draftPoints, setDraftPoints] = useState<LatLon[]>([]);
  const [notice, setNotice] = useState<string | null>(null);
  const { role } = useCurrentClub();
  // Offline after a reload the role may not be known yet: the server still checks every change it receives.
  const canWrite = role === null || can(role, 'survey.write');

  // Opening a form or a record starts it from its top (on a phone the plan stays in view above it).
  const scroller = useRef<ScrollView>(null);
  useEffect(() => {
    scroller.current?.scrollTo({ y: 0, animated: false });
  }, [panel]);

  const selected: FeatureRef | null = panel.type === 'detail' || panel.type === 'edit' ? panel.ref : null;
  const open = useCallback((ref: FeatureRef | null) => setPanel(ref ? { type: 'detail', ref } : { type: 'list' }), []);
  const me = useMemo(() => (position.latest && data.project ? { at: data.project(position.latest.lat, position.latest.lon), accuracyM: position.latest.accuracyM } : null), [position.latest, data.project]);
  const draft = useMemo(() => (data.project ? draftPoints.map((p) => data.project!(p.lat, p.lon)) : []), [draftPoints, data.project]);

  if (data.loading) {
    return (
      <View style={[styles.fill, styles.centre]} testID="survey-loading">
        <ActivityIndicator size="large" color={colors.action} />
        <Txt color={colors.inkMuted}>Opening the survey on this phone…</Txt>
      </View>
    );
  }
  if (!data.site) {
    return (
      <View style={styles.fill}>
        <EmptyState icon="map-pin" title="This site is not on this phone yet" testID="survey-no-site"
          body="Open Loftline once with a connection so the site syncs down; after that the survey works with no signal." />
      </View>
    );
  }
  const site = data.site;
  const recordOf = (ref: FeatureRef) => (ref.collection === 'supports' ? data.supports : ref.collection === 'hazards' ? data.hazards : data.positions).find((r) => r.id === ref.id) ?? null;

  const done = (id: string | null, collection: FeatureRef['collection']) => setPanel(id ? { type: 'detail', ref: { collection, id } } : { type: 'list' });
  const remove = async (ref: FeatureRef, label: string) => {
    await writes.remove(ref.collection, ref.id, `Delete ${label}`);
    setNotice(`Deleted ${label}.`);
    setPanel({ type: 'list' });
  };
  const undo = async () => {
    const label = await writes.undo();
    setNotice(label ? `Undone: ${label}.` : null);
  };

  const panelBody = (() => {
    switch (panel.type) {
      case 'add-support':
        return <SupportForm key={`new-${panel.kind}`} siteId={siteId} siteSpanM={data.siteSpanM} position={position} kind={panel.kind} onDone={(id) => done(id, 'supports')} />;
      case 'add-hazard':
        return <HazardForm key={`new-${panel.kind}`} siteId={siteId} position={position} kind={panel.kind} onDraftPoints={setDraftPoints} onDone={(id) => done(id, 'hazards')} />;
      case 'add-position':
        return <PositionForm siteId={siteId} position={position} onDone={(id) => done(id, 'operatingPositions')} />;
      case 'ground':
        return <GroundForm site={site} onDone={() => setPanel({ type: 'list' })} />;
      case 'notes':
        return <SiteNotesForm site={site} onDone={() => setPanel({ type: 'list' })} />;
      case 'edit': {
        const r = recordOf(panel.ref);
        if (!r) return <Txt>This record was deleted.</Txt>;
        if (panel.ref.collection === 'supports') return <SupportForm key={r.id} siteId={siteId} siteSpanM={data.siteSpanM} position={position} existing={r as never} onDone={() => setPanel({ type: 'detail', ref: panel.ref })} />;
        if (panel.ref.collection === 'hazards') return <HazardForm key={r.id} siteId={siteId} position={position} existing={r as never} onDraftPoints={setDraftPoints} onDone={() => setPanel({ type: 'detail', ref: panel.ref })} />;
        return <PositionForm key={r.id} siteId={siteId} position={position} existing={r as never} onDone={() => setPanel({ type: 'detail', ref: panel.ref })} />;
      }
      case 'detail': {
        const r = recordOf(panel.ref);
        if (!r) return <Txt>This record was deleted.</Txt>;
        return <RecordDetail siteId={siteId} target={panel.ref} record={r} measurements={data.measurements} canEdit={canWrite} onEdit={() => setPanel({ type: 'edit', ref: panel.ref })} onDelete={() => remove(panel.ref, r.label)} onClose={() => setPanel({ type: 'list' })} />;
      }
      default:
        return (
          <>
            {canWrite ? <SurveyAddMenu onOpen={setPanel} columns={2} /> : <Txt color={colors.inkMuted} style={styles.readOnly}>Your role can look at the survey; a scout or the lead records it.</Txt>}
            <SiteSummary site={site} canEdit={canWrite} onGround={() => setPanel({ type: 'ground' })} onNotes={() => setPanel({ type: 'notes' })} />
            <RecordList supports={data.supports} hazards={data.hazards} positions={data.positions} selected={selected} onOpen={open} />
          </>
        );
    }
  })();

  const head = (
    <View style={styles.head}>
      <View style={styles.grow}>
        <Txt variant="caption" color={colors.inkMuted}>SURVEY</Txt>
        <Txt variant={isWide ? 'heading' : 'title'} accessibilityRole="header" testID="survey-title">{site.name}</Txt>
      </View>
      {panel.type !== 'list' ? <Button label="List" icon="back" variant="quiet" compact testID="survey-back" onPress={() => setPanel({ type: 'list' })} /> : null}
      <Button label={writes.lastLabel ? 'Undo' : 'Undo'} accessibilityLabel={writes.lastLabel ? `Undo: ${writes.lastLabel}` : 'Nothing to undo'} icon="return" variant="secondary" compact testID="survey-undo" disabled={!writes.lastLabel || writes.busy} onPress={undo} />
    </View>
  );
  const noticeBar = notice ? (
    <View style={styles.notice} testID="survey-notice">
      <Txt style={styles.grow}>{notice}</Txt>
      <Button label="OK" variant="quiet" compact testID="survey-notice-close" onPress={() => setNotice(null)} />
    </View>
  ) : null;
  const caution = <Txt variant="caption" color={colors.inkMuted} style={styles.caution}>{SAFETY_CAUTION}</Txt>;
  const plan = (h: number) => <SitePlan features={data.features} me={me} selected={selected} onSelect={open} draft={draft} height={h} />;

  if (isWide) {
    const planHeight = Math.max(420, windowHeight - 140);
    return (
      <View style={[styles.fill, styles.wideRow]} testID="survey-screen">
        <View style={styles.widePlan}>{head}{plan(planHeight)}</View>
        <ScrollView ref={scroller} style={styles.wideSide} contentContainerStyle={styles.sideContent} keyboardShouldPersistTaps="handled">
          {noticeBar}
          {panelBody}
          {caution}
        </ScrollView>
      </View>
    );
  }
  const listing = panel.type === 'list' || panel.type === 'detail';
  return (
    <ScrollView ref={scroller} style={styles.fill} contentContainerStyle={styles.phoneContent} keyboardShouldPersistTaps="handled" testID="survey-screen">
      {head}
      {noticeBar}
      {plan(listing ? 320 : 240)}
      <View style={{ height: spacing.l }} />
      {panelBody}
      {caution}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1, backgroundColor: colors.paper },
  grow: { flex: 1 },
  centre: { alignItems: 'center', justifyContent: 'center', gap: spacing.m },
  head: { flexDirection: 'row', alignItems: 'center', gap: spacing.s, marginBottom: spacing.m },
  phoneContent: { padding: spacing.l, paddingBottom: 96 },
  wideRow: { flexDirection: 'row', gap: spacing.xl, padding: spacing.xl },
  widePlan: { flex: 1, minWidth: 360 },
  // Wide enough for a list row with its sync badge and for the forms' two-word choices.
  wideSide: { width: 420, flexGrow: 0, flexShrink: 0 },
  sideContent: { paddingBottom: spacing.xxxl },
  notice: { flexDirection: 'row', alignItems: 'center', backgroundColor: colors.infoSoft, borderRadius: radii.m, paddingHorizontal: spacing.m, marginBottom: spacing.m, borderWidth: 1.5, borderColor: colors.info },
  caution: { marginTop: spacing.xl },
  readOnly: { marginBottom: spacing.l },
});
