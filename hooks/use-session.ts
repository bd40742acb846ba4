// The signed-in person: GET /api/me (null when signed out), sign-in and sign-out through better-auth.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api, ApiError } from './api-client';

export type Role = 'admin' | 'lead' | 'technician' | 'user';
export type Me = { id: string; email: string; name: string; role: Role };

export const sessionKeys = { root: ['session'] as const };

export function useSessionQuery() {
  return useQuery({
    queryKey: sessionKeys.root,
    queryFn: async (): Promise<Me | null> => {
      try {
        return (await api<{ user: Me }>('/api/me')).user;
      } catch (err) {
        if (err instanceof ApiError && (err.status === 401 || err.status === 403)) return null;
        throw err;
      }
    },
    staleTime: 60_000,
  });
}

/** Turns better-auth's sign-in failures into plain words. */
export function signInMessage(err: unknown): string {
  if (!(err instanceof ApiError)) return 'Sign-in failed. Try again.';
  if (err.status === 429) return 'Too many sign-in attempts. Wait a minute, then try again.';
  if (err.code === 'INVALID_EMAIL_OR_PASSWORD' || err.status === 401) return 'That e-mail and password do not match an account.';
  if (err.code === 'BANNED_USER' || /banned/i.test(err.message)) return 'This account has been deactivated. Ask your admin.';
  if (err.code === 'INVALID_EMAIL') return 'Enter a valid e-mail address.';
  if (err.status === 0) return err.message;
  return err.message || 'Sign-in failed. Try again.';
}

export function useSignInMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { email: string; password: string }) => api('/api/auth/sign-in/email', { body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: sessionKeys.root }),
  });
}

export function useSignOutMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api('/api/auth/sign-out', { body: {} }),
    onSettled: () => {
      qc.clear();
      qc.setQueryData(sessionKeys.root, null);
    },
  });
}
