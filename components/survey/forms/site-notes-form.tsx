import { useState } from 'react';
import { View } from 'react-native';
import { TextField, Txt } from '@/components/ui';
import { colors, spacing } from '@/constants/theme';
import { useRecordSave } from '@/hooks/survey/use-record-save';
import { siteFieldsOf } from '@/components/survey/records/site-fields';
import type { Site } from '@/shared/schemas';
import { FormFooter } from './form-footer';
import { checkSiteNotes } from './site-form-logic';

/** Access, parking, permissions and the site's rules, for the lead and the crews. */
export function SiteNotesForm({ site, onDone }: { site: Site; onDone: () => void }) {
  const { busy, saveError, run, upsert } = useRecordSave();
  const [draft, setDraft] = useState({ accessNotes: site.accessNotes, rules: site.rules, notes: site.notes });
  const check = checkSiteNotes(draft);
  const set = (k: keyof typeof draft) => (v: string) => setDraft((d) => ({ ...d, [k]: v }));
  const save = () => run(async () => {
    if (!check.fields) return;
    await upsert('sites', site, { ...siteFieldsOf(site), ...check.fields }, 'the site notes');
    onDone();
  });
  return (
    <View testID="site-notes-form">
      <Txt variant="title" style={{ marginBottom: spacing.m }}>Site notes</Txt>
      <TextField label="Access and parking" testID="site-access" multiline value={draft.accessNotes} onChangeText={set('accessNotes')} error={check.errors.accessNotes} hint="Gate, keys, where vehicles may go, who to call" />
      <TextField label="Rules and permissions" testID="site-rules" multiline value={draft.rules} onChangeText={set('rules')} error={check.errors.rules} hint="One per line: “No stakes”, “No launchers after 18:00”, “Permit from the parks office”" />
      {check.reminders.map((r) => <Txt key={r} color={colors.info} variant="bodyStrong" style={{ marginBottom: spacing.xs }}>ℹ {r}</Txt>)}
      <TextField label="Other notes" testID="site-notes" multiline value={draft.notes} onChangeText={set('notes')} error={check.errors.notes} />
      <FormFooter testID="site-notes" questions={[]} blockers={Object.values(check.errors)} saveError={saveError} canSave={!!check.fields && !busy} busy={busy} onSave={save} onCancel={onDone} />
    </View>
  );
}
