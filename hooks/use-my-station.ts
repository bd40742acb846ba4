// The office user's own PC: its record, the checked edit, sending files to the technicians.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { PlanStateValue, UserEditInput } from '@/db/requests/plans';
import { api } from './api-client';
import type { PlanResultJson } from './use-plans';

export type MyStation =
  | { station: null }
  | {
      station: { id: number; name: string; number: number; location: string };
      site: { id: number; name: string };
      profile: { dos: string | undefined; network: string | null; kit: string | null; profileError: string | null };
      files: { autoexec: { text: string | null; uploadedAt: string | null }; config: { text: string | null; uploadedAt: string | null } };
      latestPlan: { id: number; revision: number; state: PlanStateValue; current: boolean } | null;
    };

export const myStationKeys = { root: ['my-station'] as const };

export function useMyStationQuery() {
  return useQuery({ queryKey: myStationKeys.root, queryFn: () => api<MyStation>('/api/my-station') });
}

export function useCheckEditMutation(stationId: number) {
  return useMutation({ mutationFn: (v: UserEditInput) => api<{ result: PlanResultJson }>(`/api/my-station/${stationId}/check`, { body: v }) });
}

export function useSendEditMutation(stationId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (v: UserEditInput) => api<{ planId: number; revision: number; stored: string[] }>(`/api/my-station/${stationId}/send`, { body: v }),
    onSuccess: () => qc.invalidateQueries({ queryKey: myStationKeys.root }),
  });
}
