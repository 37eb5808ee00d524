import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { Select, Tabular, TextField, Txt } from '@/components/ui';
import { colors, radii, spacing, touchTargetPx } from '@/constants/theme';
import { useRecordSave } from '@/hooks/survey/use-record-save';
import { siteFieldsOf } from '@/components/survey/records/site-fields';
import type { Site } from '@/shared/schemas';
import { GROUND_CHOICES, choiceOfSite, classConstants, fieldsForChoice, fieldsForExpert, groundChoice, type GroundChoiceId } from '../ground/ground-choices';
import { FormFooter } from './form-footer';

/** The ground under the antennas, in words a scout can judge by looking and feeling, or by value. */
export function GroundForm({ site, onDone }: { site: Site; onDone: () => void }) {
  const { busy, saveError, run, upsert } = useRecordSave();
  const initial = choiceOfSite(site);
  const [mode, setMode] = useState<'words' | 'expert'>(initial === 'expert' ? 'expert' : 'words');
  const [choice, setChoice] = useState<GroundChoiceId | null>(initial && initial !== 'expert' ? initial : null);
  const [ownWords, setOwnWords] = useState('');
  const [sigmaText, setSigma] = useState(site.groundSigmaSPerM !== null ? String(site.groundSigmaSPerM) : '');
  const [epsRText, setEpsR] = useState(site.groundEpsR !== null ? String(site.groundEpsR) : '');
  const [expertWords, setExpertWords] = useState(initial === 'expert' ? site.groundDescription : '');

  const expert = fieldsForExpert({ sigmaText, epsRText, ownWords: expertWords });
  const fields = mode === 'words' ? (choice ? fieldsForChoice(choice, ownWords) : null) : expert.ok ? expert.fields : null;
  const picked = choice ? groundChoice(choice) : null;
  const constants = picked ? classConstants(picked.classId) : null;

  const save = () => run(async () => {
    if (!fields) return;
    await upsert('sites', site, { ...siteFieldsOf(site), ...fields }, 'the ground');
    onDone();
  });

  return (
    <View testID="ground-form">
      <Txt variant="title" style={{ marginBottom: spacing.m }}>Ground</Txt>
      <Select label="Describe it" testID="ground-mode" value={mode} onChange={setMode} options={[{ value: 'words', label: 'In plain words' }, { value: 'expert', label: 'By value (expert)' }]} />
      {mode === 'words' ? (
        <>
          <View style={styles.grid} accessibilityRole="radiogroup" accessibilityLabel="What the ground is like">
            {GROUND_CHOICES.map((c) => {
              const selected = c.id === choice;
              return (
                <Pressable key={c.id} testID={`ground-choice-${c.id}`} accessibilityRole="radio" accessibilityLabel={c.label} accessibilityState={{ selected, checked: selected }}
                  onPress={() => setChoice(c.id)} style={[styles.choice, selected && styles.selected]}>
                  <Txt variant="bodyStrong" color={selected ? colors.onAction : colors.ink}>{c.label}</Txt>
                  <Txt variant="caption" color={selected ? colors.onAction : colors.inkMuted}>{c.hint}</Txt>
                </Pressable>
              );
            })}
          </View>
          {picked ? (
            <View style={styles.reason} testID="ground-reason">
              <Txt variant="bodyStrong">Planned as: {picked.classId}</Txt>
              {constants ? <Tabular>σ {constants.sigmaSPerM} S/m · εr {constants.epsR}</Tabular> : null}
              <Txt>{picked.reason}</Txt>
              {constants ? <Txt variant="caption" color={colors.inkMuted}>Source: {constants.source}</Txt> : null}
            </View>
          ) : null}
          <TextField label="Your own words (optional)" testID="ground-words" value={ownWords} onChangeText={setOwnWords} hint="“Soaked after last night’s rain”, “clay under the grass”" />
        </>
      ) : (
        <>
          <TextField label="Conductivity σ" testID="ground-sigma" suffix="S/m" inputMode="decimal" value={sigmaText} onChangeText={setSigma} error={sigmaText && !expert.ok ? expert.errors.sigma : undefined} />
          <TextField label="Relative permittivity εr" testID="ground-epsr" inputMode="decimal" value={epsRText} onChangeText={setEpsR} error={epsRText && !expert.ok ? expert.errors.epsR : undefined} />
          <TextField label="Where the values come from" testID="ground-expert-words" value={expertWords} onChangeText={setExpertWords} hint="A probe measurement, a survey map…" />
        </>
      )}
      <FormFooter testID="ground" questions={[]} blockers={mode === 'words' ? (choice ? [] : ['Pick the words that fit the ground best']) : expert.ok ? [] : Object.values(expert.errors)} saveError={saveError} canSave={!!fields && !busy} busy={busy} onSave={save} onCancel={onDone} />
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { gap: spacing.s, marginBottom: spacing.l },
  choice: { minHeight: touchTargetPx, borderWidth: 2, borderColor: colors.line, borderRadius: radii.m, padding: spacing.m, backgroundColor: colors.surface, gap: spacing.xxs },
  selected: { backgroundColor: colors.ink, borderColor: colors.ink },
  reason: { backgroundColor: colors.okSoft, borderRadius: radii.m, padding: spacing.m, gap: spacing.xs, marginBottom: spacing.l, borderWidth: 1.5, borderColor: colors.ok },
});
