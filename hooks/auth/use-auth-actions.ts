import { useMutation } from '@tanstack/react-query';
import { tokensSchema, type Tokens } from '@/shared/schemas';
import { apiFetch } from '@/hooks/api/client';
import { useSession } from './use-session';

type SignInBody = { email: string; password: string };
type SignUpBody = { email: string; password: string; displayName: string; callSign: string };

/** Mutations of the identity API; each successful one keeps the tokens so the person is signed in. */
export function useSignIn() {
  const { signIn } = useSession();
  return useMutation({
    mutationFn: async (body: SignInBody) => tokensSchema.parse(await apiFetch<Tokens>('/api/auth/sign-in', { method: 'POST', json: body, auth: false })),
    onSuccess: signIn,
  });
}

export function useSignUp() {
  const { signIn } = useSession();
  return useMutation({
    mutationFn: async (body: SignUpBody) => tokensSchema.parse(await apiFetch<Tokens>('/api/auth/sign-up', { method: 'POST', json: body, auth: false })),
    onSuccess: signIn,
  });
}

export function useForgotPassword() {
  return useMutation({
    mutationFn: (body: { email: string }) => apiFetch<void>('/api/auth/forgot-password', { method: 'POST', json: body, auth: false }),
  });
}

export function useResetPassword() {
  return useMutation({
    mutationFn: (body: { token: string; password: string }) => apiFetch<void>('/api/auth/reset-password', { method: 'POST', json: body, auth: false }),
  });
}
