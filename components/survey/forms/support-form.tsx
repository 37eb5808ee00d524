import { useState } from 'react';
import { View } from 'react-native';
import { Button, Select, TextField, Txt } from '@/components/ui';
import { colors, spacing } from '@/constants/theme';
import { useSession } from '@/hooks/auth/use-session';
import { useRecordSave } from '@/hooks/survey/use-record-save';
import type { PositionState } from '@/hooks/survey/use-position';
import { useUnits } from '@/hooks/use-units';
import { LAUNCH_METHODS, type Support } from '@/shared/schemas';
import { PlacementPicker, type Placement } from '../placement/placement-picker';
import { LAUNCH_LABEL, SUPPORT_KIND_LABEL } from '../records/record-summary';
import { FormFooter } from './form-footer';
import { HeightMeasure, type MeasuredHeight } from './height-measure';
import { ATTACH_DEFAULT_NOTE, defaultAttachHeightM } from './height-math';
import { checkSupport, draftFromSupport, emptySupportDraft, type SupportDraft, type SupportKind } from './support-form-logic';

type Props = {
  siteId: string;
  siteSpanM: number | null;
  position: PositionState;
  /** Editing an existing support, or adding a new one of `kind`. */
  existing?: Support;
  kind?: SupportKind;
  onDone: (id: string | null) => void;
};

export function SupportForm({ siteId, siteSpanM, position, existing, kind = 'tree', onDone }: Props) {
  const { lengthToM, mToLength, lengthUnit, formatLengthM } = useUnits();
  const { busy, saveError, run, upsert, append } = useRecordSave();
  const { user } = useSession();
  const [draft, setDraft] = useState<SupportDraft>(() => (existing ? draftFromSupport(existing, mToLength) : { ...emptySupportDraft(kind), label: '' }));
  const [placement, setPlacement] = useState<Placement | null>(null);
  const [moving, setMoving] = useState(!existing);
  const [heightMode, setHeightMode] = useState<'measure' | 'type'>(existing?.heightM != null || draft.kind !== 'tree' ? 'type' : 'measure');
  const [measured, setMeasured] = useState<MeasuredHeight | null>(null);

  const set = <K extends keyof SupportDraft>(k: K) => (v: SupportDraft[K]) => setDraft((d) => ({ ...d, [k]: v }));
  const heightText = heightMode === 'measure' ? (measured ? String(mToLength(measured.heightM)) : '') : draft.heightText;
  const effective: SupportDraft = {
    ...draft,
    heightText,
    ...(moving ? { lat: placement?.lat ?? null, lon: placement?.lon ?? null, positionAccuracyM: placement?.accuracyM ?? null } : {}),
  };
  const check = checkSupport(effective, siteId, lengthToM, { siteSpanM });
  const shown = (k: string) => check.errors[k];
  const heightM = heightText ? lengthToM(Number(heightText)) : null;
  const suggestedAttach = draft.kind === 'tree' && heightM !== null && Number.isFinite(heightM) ? defaultAttachHeightM(heightM, draft.launchMethod) : null;

  const save = () => run(async () => {
    if (!check.fields) return;
    const takenAt = new Date().toISOString();
    const takenBy = user?.id ?? null;
    const id = await upsert('supports', existing, check.fields, check.fields.label);
    if (moving && placement) {
      await append('measurements', { siteId, subjectCollection: 'supports', subjectId: id, kind: 'gps-fix', method: placement.measurement.method, inputs: placement.measurement.inputs, valueM: placement.measurement.valueM, takenAt, takenBy });
    }
    if (heightMode === 'measure' && measured) {
      await append('measurements', { siteId, subjectCollection: 'supports', subjectId: id, kind: 'height', method: measured.method, inputs: measured.inputs, valueM: measured.heightM, takenAt, takenBy });
    }
    onDone(id);
  });

  return (
    <View testID="support-form">
      <Txt variant="title" style={{ marginBottom: spacing.m }}>{existing ? `Edit ${existing.label}` : `New ${SUPPORT_KIND_LABEL[draft.kind].toLowerCase()}`}</Txt>
      <Select label="Kind" testID="support-kind" value={draft.kind} onChange={(k) => setDraft((d) => ({ ...d, kind: k, maxEndsText: k === 'mast' ? '1' : d.maxEndsText, launchMethod: k === 'mast' ? 'none' : d.launchMethod === 'none' ? null : d.launchMethod }))}
        options={(['tree', 'mast', 'structure'] as const).map((k) => ({ value: k, label: SUPPORT_KIND_LABEL[k] }))} />
      <TextField label="Label" testID="support-label" value={draft.label} onChangeText={set('label')} error={draft.label ? shown('label') : undefined} hint="A name the crew will recognise: “Big oak by the gate”" />
      {moving ? (
        <PlacementPicker position={position} value={placement} onChange={setPlacement} testID="support-place" what={`the ${SUPPORT_KIND_LABEL[draft.kind].toLowerCase()}`} error={shown('lat') && placement === null ? undefined : shown('positionAccuracyM')} />
      ) : (
        <View style={{ marginBottom: spacing.l, gap: spacing.xs }}>
          <Txt variant="label">Position</Txt>
          <Txt>Kept where it was recorded (±{formatLengthM(existing?.positionAccuracyM ?? null)}).</Txt>
          <Button label="Move it" testID="support-move" variant="secondary" compact onPress={() => setMoving(true)} />
        </View>
      )}
      {draft.kind === 'tree' ? (
        <Select label="Height" testID="support-height-mode" value={heightMode} onChange={setHeightMode} options={[{ value: 'measure', label: 'Measure it' }, { value: 'type', label: 'Type it' }]} />
      ) : null}
      {heightMode === 'measure' && draft.kind === 'tree'
        ? <HeightMeasure testID="height" onResult={setMeasured} />
        : <TextField label={draft.kind === 'mast' ? 'Mast height when up' : 'Height'} testID="support-height" suffix={lengthUnit} inputMode="decimal" value={draft.heightText} onChangeText={set('heightText')} error={draft.heightText ? shown('heightM') : undefined} />}
      {heightMode === 'measure' && shown('heightM') && measured ? <Txt color={colors.danger}>{shown('heightM')}</Txt> : null}
      {draft.kind === 'mast' ? (
        <TextField label="Mast the club would bring" testID="support-mast-model" value={draft.mastModel} onChangeText={set('mastModel')} hint="For example “9 m telescopic fibreglass, top pulley”" error={shown('mastModel')} />
      ) : (
        <Select label="How a line gets up" testID="support-launch" value={draft.launchMethod} onChange={set('launchMethod')}
          options={LAUNCH_METHODS.filter((m) => draft.kind !== 'tree' || m !== 'none').map((m) => ({ value: m, label: LAUNCH_LABEL[m] }))} />
      )}
      <TextField label="Usable attachment height" testID="support-attach" suffix={lengthUnit} inputMode="decimal" value={draft.attachHeightText} onChangeText={set('attachHeightText')}
        error={draft.attachHeightText ? shown('attachHeightM') : undefined}
        hint={suggestedAttach !== null ? `Suggested ${formatLengthM(suggestedAttach)}: ${ATTACH_DEFAULT_NOTE}` : 'The highest point a line can really go over (a branch fork, the top pulley)'} />
      {suggestedAttach !== null && !draft.attachHeightText ? (
        <Button label={`Use ${formatLengthM(suggestedAttach)}`} testID="support-attach-suggested" variant="quiet" compact onPress={() => set('attachHeightText')(String(Math.round(mToLength(suggestedAttach) * 10) / 10))} />
      ) : null}
      <TextField label="Wire ends it can hold" testID="support-max-ends" inputMode="numeric" value={draft.maxEndsText} onChangeText={set('maxEndsText')} error={shown('maxEnds')} hint="A mast with one pulley: 1. A big tree with two good forks: 2." />
      {draft.kind === 'tree' ? (
        <>
          <TextField label="Species" testID="support-species" value={draft.species} onChangeText={set('species')} error={shown('species')} />
          <TextField label="Condition" testID="support-condition" multiline value={draft.condition} onChangeText={set('condition')} error={shown('condition')} hint="Dead limbs, lowest clear branch, lean, anything a throw line could snag on" />
        </>
      ) : null}
      <TextField label="Notes" testID="support-notes" multiline value={draft.notes} onChangeText={set('notes')} error={shown('notes')} />
      <FormFooter testID="support" questions={check.questions} blockers={Object.values(check.errors)} saveError={saveError} canSave={!!check.fields && !busy} busy={busy} onSave={save} onCancel={() => onDone(null)} />
    </View>
  );
}
