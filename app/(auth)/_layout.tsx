import { Redirect, Slot, useGlobalSearchParams, usePathname } from 'expo-router';
import { safeNext } from '@/components/auth/safe-next';
import { useSession } from '@/hooks/auth/use-session';

/** Pages for people not signed in; a signed-in person goes on to where they were headed. */
export default function AuthLayout() {
  const { tokens } = useSession();
  const pathname = usePathname();
  const { next } = useGlobalSearchParams<{ next?: string }>();
  if (tokens && pathname !== '/reset-password') return <Redirect href={safeNext(next)} />;
  return <Slot />;
}
