// Kits: one key root, a key factory, query and mutation hooks.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Page } from '@/db/requests/common';
import type { KitCreateInput, KitRecord, KitUpdateInput } from '@/db/requests/kits';
import { api } from './api-client';
import { toQueryString } from './use-sites';

export type Kit = KitRecord;

export const kitKeys = {
  root: ['kits'] as const,
  list: (archived: boolean) => [...kitKeys.root, 'list', archived] as const,
  one: (id: number) => [...kitKeys.root, 'one', id] as const,
};

export function useKitsQuery(archived = false) {
  return useQuery({ queryKey: kitKeys.list(archived), queryFn: () => api<Page<Kit>>(`/api/kits${toQueryString({ archived, limit: 500 })}`) });
}

export function useKitQuery(id: number | null | undefined) {
  return useQuery({ queryKey: kitKeys.one(id ?? 0), queryFn: () => api<Kit>(`/api/kits/${id}`), enabled: !!id });
}

function useInvalidate() {
  const qc = useQueryClient();
  return () => qc.invalidateQueries({ queryKey: kitKeys.root });
}

export function useCreateKitMutation() {
  const invalidate = useInvalidate();
  return useMutation({ mutationFn: (v: KitCreateInput) => api<Kit>('/api/kits', { body: v }), onSuccess: invalidate });
}

export function useUpdateKitMutation() {
  const invalidate = useInvalidate();
  return useMutation({ mutationFn: ({ id, ...v }: KitUpdateInput & { id: number }) => api<Kit>(`/api/kits/${id}`, { method: 'PATCH', body: v }), onSuccess: invalidate });
}

export function useArchiveKitMutation() {
  const invalidate = useInvalidate();
  return useMutation({
    mutationFn: (v: { id: number; version: number; archived: boolean }) => api<Kit>(`/api/kits/${v.id}/${v.archived ? 'archive' : 'restore'}`, { body: { version: v.version } }),
    onSuccess: invalidate,
  });
}
