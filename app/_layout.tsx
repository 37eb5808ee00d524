import { Slot } from 'expo-router';
import { AppProviders } from '@/components/shell/app-providers';
import { UpdatePrompt } from '@/components/offline/update-prompt';

export default function RootLayout() {
  return (
    <AppProviders>
      <Slot />
      <UpdatePrompt />
    </AppProviders>
  );
}
