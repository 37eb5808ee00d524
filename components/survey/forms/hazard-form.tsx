import { useState } from 'react';
import { View } from 'react-native';
import { Select, TextField, Txt } from '@/components/ui';
import { colors, spacing } from '@/constants/theme';
import { useRecordSave } from '@/hooks/survey/use-record-save';
import type { PositionState } from '@/hooks/survey/use-position';
import { useUnits } from '@/hooks/use-units';
import { HAZARD_KINDS, VOLTAGE_CLASSES, type Hazard } from '@/shared/schemas';
import { PointMarker } from '../placement/point-marker';
import { FormFooter } from './form-footer';
import { AREA_BY_DEFAULT, HAZARD_KIND_LABEL, VOLTAGE_HELP, checkHazard, draftFromHazard, emptyHazardDraft, type HazardDraft, type HazardKind } from './hazard-form-logic';
import { PowerLineCaution } from './power-line-caution';

type Props = { siteId: string; position: PositionState; existing?: Hazard; kind?: HazardKind; onDone: (id: string | null) => void; onDraftPoints?: (p: HazardDraft['points']) => void };

export function HazardForm({ siteId, position, existing, kind = 'power-line', onDone, onDraftPoints }: Props) {
  const { lengthToM, mToLength, lengthUnit } = useUnits();
  const { busy, saveError, run, upsert } = useRecordSave();
  const [draft, setDraft] = useState<HazardDraft>(() => (existing ? draftFromHazard(existing, mToLength) : emptyHazardDraft(kind)));
  const set = <K extends keyof HazardDraft>(k: K) => (v: HazardDraft[K]) => setDraft((d) => ({ ...d, [k]: v }));
  const setPoints = (points: HazardDraft['points']) => { set('points')(points); onDraftPoints?.(points); };
  const check = checkHazard(draft, siteId, lengthToM);
  const isPower = draft.kind === 'power-line';

  const save = () => run(async () => {
    if (!check.fields) return;
    const id = await upsert('hazards', existing, check.fields, check.fields.label);
    onDraftPoints?.([]);
    onDone(id);
  });

  return (
    <View testID="hazard-form">
      <Txt variant="title" style={{ marginBottom: spacing.m }}>{existing ? `Edit ${existing.label}` : `New ${HAZARD_KIND_LABEL[draft.kind].toLowerCase()}`}</Txt>
      <Select label="What is it?" testID="hazard-kind" value={draft.kind} onChange={(k) => setDraft((d) => ({ ...d, kind: k, isArea: AREA_BY_DEFAULT[k], voltageClass: k === 'power-line' ? d.voltageClass ?? 'unknown' : null }))}
        options={HAZARD_KINDS.map((k) => ({ value: k, label: HAZARD_KIND_LABEL[k] }))} />
      {isPower ? <PowerLineCaution /> : null}
      <TextField label="Label" testID="hazard-label" value={draft.label} onChangeText={set('label')} error={draft.label ? check.errors.label : undefined} hint={isPower ? 'For example “Line along the north fence”' : undefined} />
      {!isPower ? (
        <Select label="Drawn as" testID="hazard-shape" value={draft.isArea ? 'area' : 'line'} onChange={(v) => set('isArea')(v === 'area')} options={[{ value: 'line', label: 'A line' }, { value: 'area', label: 'An area (corners)' }]} />
      ) : null}
      <Txt variant="caption" color={colors.inkMuted} style={{ marginBottom: spacing.s }}>
        {isPower ? 'Walk along the line (never under a sagging or broken one) and mark at least two points: at poles, where it crosses a path, where it bends.' : draft.isArea ? 'Walk its edge and mark each corner.' : 'Mark points along it.'}
      </Txt>
      <PointMarker position={position} points={draft.points} onPoints={setPoints} testID="hazard-points" noun={draft.isArea ? 'corner' : 'point'} />
      {check.errors.points && draft.points.length > 0 ? <Txt color={colors.danger} testID="hazard-points-error">{check.errors.points}</Txt> : null}
      {isPower ? (
        <>
          <Select label="Voltage class" testID="hazard-voltage" value={draft.voltageClass} onChange={set('voltageClass')} options={VOLTAGE_CLASSES.map((v) => ({ value: v, label: VOLTAGE_HELP[v].label }))} />
          <View style={{ marginBottom: spacing.l, gap: spacing.xs }} testID="hazard-voltage-help">
            {VOLTAGE_CLASSES.map((v) => (
              <Txt key={v} variant="caption" color={draft.voltageClass === v ? colors.ink : colors.inkMuted}>
                <Txt variant="caption" style={{ fontWeight: '700' }}>{VOLTAGE_HELP[v].label}: </Txt>{VOLTAGE_HELP[v].help}
              </Txt>
            ))}
          </View>
          <TextField label="Voltage if known" testID="hazard-kv" suffix="kV" inputMode="decimal" value={draft.voltageKvText} onChangeText={set('voltageKvText')} error={check.errors.voltageKv} hint="From a pole tag or the utility; leave empty if not known" />
          <TextField label="Estimated height of the lowest wire" testID="hazard-height" suffix={lengthUnit} inputMode="decimal" value={draft.heightText} onChangeText={set('heightText')} error={check.errors.heightM} hint="Estimate from the ground; never measure it by touching" />
        </>
      ) : null}
      <TextField label="Notes" testID="hazard-notes" multiline value={draft.notes} onChangeText={set('notes')} error={check.errors.notes} />
      <FormFooter testID="hazard" questions={check.questions} blockers={Object.values(check.errors)} saveError={saveError} canSave={!!check.fields && !busy} busy={busy} onSave={save} onCancel={() => { onDraftPoints?.([]); onDone(null); }} />
    </View>
  );
}
