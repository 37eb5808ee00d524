import { Slot } from 'expo-router';
import { AppShell } from '@/components/shell/app-shell';

export default function SignedInLayout() {
  return (
    <AppShell>
      <Slot />
    </AppShell>
  );
}
