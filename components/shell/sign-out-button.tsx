import { useRouter } from 'expo-router';
import { Button } from '@/components/ui';
import { useSession } from '@/hooks/auth/use-session';

/** Signs out on this device (the server revokes the refresh token when it can be reached) and goes to sign-in. */
export function SignOutButton({ testID, variant = 'danger' }: { testID: string; variant?: 'danger' | 'quiet' }) {
  const { signOut } = useSession();
  const router = useRouter();
  return (
    <Button
      label="Sign out"
      icon="sign-out"
      variant={variant}
      testID={testID}
      onPress={async () => {
        await signOut();
        router.replace('/sign-in');
      }}
    />
  );
}
