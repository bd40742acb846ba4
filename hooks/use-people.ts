import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { InviteInput } from '@/db/requests/people';
import { api } from './api-client';
import type { Role } from './use-session';

export type Person = { id: string; name: string; email: string; role: Role | null; banned: boolean | null; invitationPending: boolean };

export const peopleKeys = {
  root: ['people'] as const,
  list: (offset: number) => [...peopleKeys.root, 'list', offset] as const,
};

export function usePeopleQuery(offset = 0) {
  return useQuery({
    queryKey: peopleKeys.list(offset),
    queryFn: () => api<{ items: Person[]; total: number }>(`/api/people?limit=100&offset=${offset}`),
  });
}

function useInvalidate() {
  const qc = useQueryClient();
  return () => qc.invalidateQueries({ queryKey: peopleKeys.root });
}

export function useInviteMutation() {
  const invalidate = useInvalidate();
  return useMutation({ mutationFn: (v: InviteInput) => api('/api/people/invite', { body: v }), onSuccess: invalidate });
}

export function useSetRoleMutation() {
  const invalidate = useInvalidate();
  return useMutation({ mutationFn: (v: { id: string; role: Role }) => api(`/api/people/${v.id}/role`, { method: 'PATCH', body: { role: v.role } }), onSuccess: invalidate });
}

export function useSetActiveMutation() {
  const invalidate = useInvalidate();
  return useMutation({
    mutationFn: (v: { id: string; active: boolean }) => api(`/api/people/${v.id}/${v.active ? 'reactivate' : 'deactivate'}`, { body: {} }),
    onSuccess: invalidate,
  });
}
