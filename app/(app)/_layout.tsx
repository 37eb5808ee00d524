import { Slot } from 'expo-router';
import { AppShell } from '@/components/shell/app-shell';
import { E2eHooks } from '@/components/offline/e2e-hooks';

export default function SignedInLayout() {
  return (
    <AppShell>
      <Slot />
      <E2eHooks />
    </AppShell>
  );
}
