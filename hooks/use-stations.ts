// Stations, their profiles, startup-file revisions and the plan preview: one key root, a key factory,
// query and mutation hooks. Mutations invalidate through the factory.
import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ProfileDraft, ProfileWriteInput, StationCreateInput, StationUpdateInput, WizardStep, FileKind } from '@/db/requests/stations';
import type { NumberRangesInput, StationKind } from '@/db/requests/sites';
import type { DirectoryRow } from '@/server/stations/directory';
import type { PlanJson } from '@/server/stations/plan-input';
import { api } from './api-client';

type Json<T> = { [K in keyof T]: T[K] extends Date ? string : T[K] extends Date | null ? string | null : T[K] };
export type StationRow = Json<DirectoryRow>;
export type StationListParams = { sort?: string; dir?: 'asc' | 'desc'; q?: string; kind?: StationKind; archived?: boolean; limit?: number; offset?: number };
export type StationList = { items: StationRow[]; total: number; limit: number; offset: number; nextNumbers: Record<StationKind, number | null> };

export type FileRevision = {
  id: number;
  stationId: number;
  kind: FileKind;
  absent: boolean;
  sha256: string;
  size: number;
  source: 'upload' | 'paste' | 'user' | 'seed' | 'none';
  uploadedBy: string | null;
  uploadedAt: string;
};
export type StationProfile = { data: ProfileDraft; kitId: number | null; wizardStep: WizardStep; version: number; updatedAt: string };
export type StationDetail = {
  station: { id: number; siteId: number; kind: StationKind; name: string; number: number; location: string; notes: string; archivedAt: string | null; version: number; linkedUser: boolean };
  site: { id: number; name: string; numberRanges: NumberRangesInput };
  profile: StationProfile | null;
  files: { autoexec: FileRevision | null; config: FileRevision | null };
};
export type PlanPreview = { plan: PlanJson; profileError: string | null; kit: { id: number; name: string; minDos: string } | null; inputs: { autoexec: FileRevision | null; config: FileRevision | null } };

export const stationKeys = {
  root: ['stations'] as const,
  list: (siteId: number, p: StationListParams) => [...stationKeys.root, 'list', siteId, p] as const,
  one: (id: number) => [...stationKeys.root, 'one', id] as const,
  files: (id: number) => [...stationKeys.root, 'files', id] as const,
  fileText: (id: number, fileId: number) => [...stationKeys.root, 'file-text', id, fileId] as const,
  plan: (id: number, draft: unknown) => [...stationKeys.root, 'plan', id, draft] as const,
};

function qs(p: Record<string, unknown>): string {
  const parts = Object.entries(p)
    .filter(([, v]) => v !== undefined && v !== null && v !== '')
    .map(([k, v]) => `${encodeURIComponent(k)}=${encodeURIComponent(String(v))}`);
  return parts.length ? `?${parts.join('&')}` : '';
}

export function useStationsQuery(siteId: number, p: StationListParams = {}) {
  return useQuery({
    queryKey: stationKeys.list(siteId, p),
    queryFn: () => api<StationList>(`/api/sites/${siteId}/stations${qs(p)}`),
    enabled: siteId > 0,
    placeholderData: keepPreviousData,
  });
}

export function useStationQuery(id: number) {
  return useQuery({ queryKey: stationKeys.one(id), queryFn: () => api<StationDetail>(`/api/stations/${id}`), enabled: id > 0 });
}

export function useFilesQuery(id: number) {
  return useQuery({ queryKey: stationKeys.files(id), queryFn: () => api<{ items: FileRevision[] }>(`/api/stations/${id}/files`), enabled: id > 0 });
}

export function useFileTextQuery(stationId: number, fileId: number | null | undefined) {
  return useQuery({
    queryKey: stationKeys.fileText(stationId, fileId ?? 0),
    queryFn: () => api<FileRevision & { text: string | null }>(`/api/stations/${stationId}/files/${fileId}`),
    enabled: !!fileId,
    staleTime: Infinity,
  });
}

/** The live plan for a station, with an unsaved draft when given (nothing is saved either way). */
export function usePlanPreviewQuery(id: number, draft?: { data: ProfileDraft; kitId: number | null }, enabled = true) {
  return useQuery({
    queryKey: stationKeys.plan(id, draft ?? null),
    queryFn: () => api<PlanPreview>(`/api/stations/${id}/plan`, { body: draft ?? {} }),
    enabled: id > 0 && enabled,
    placeholderData: keepPreviousData,
  });
}

function useInvalidate() {
  const qc = useQueryClient();
  return () => Promise.all([qc.invalidateQueries({ queryKey: stationKeys.root }), qc.invalidateQueries({ queryKey: ['sites'] })]);
}

export function useCreateStationMutation() {
  const invalidate = useInvalidate();
  return useMutation({ mutationFn: (v: StationCreateInput) => api<StationDetail['station']>('/api/stations', { body: v }), onSuccess: invalidate });
}

export function useUpdateStationMutation(id: number) {
  const invalidate = useInvalidate();
  return useMutation({ mutationFn: (v: StationUpdateInput) => api<StationDetail['station']>(`/api/stations/${id}`, { method: 'PATCH', body: v }), onSuccess: invalidate });
}

export function useArchiveStationMutation(id: number) {
  const invalidate = useInvalidate();
  return useMutation({
    mutationFn: (v: { version: number; archived: boolean }) => api(`/api/stations/${id}/${v.archived ? 'archive' : 'restore'}`, { body: { version: v.version } }),
    onSuccess: invalidate,
  });
}

export function useSaveProfileMutation(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (v: ProfileWriteInput) => api<StationProfile>(`/api/stations/${id}/profile`, { method: 'PUT', body: v }),
    onSuccess: (profile) => {
      qc.setQueryData<StationDetail>(stationKeys.one(id), (old) => (old ? { ...old, profile } : old));
      return qc.invalidateQueries({ queryKey: stationKeys.root });
    },
  });
}

/** Records a startup file: an uploaded File (web), pasted text, or "this machine has none". */
export type FileInputChoice = { kind: FileKind } & ({ mode: 'upload'; file: Blob; name: string } | { mode: 'paste'; text: string } | { mode: 'none' });

export function useRecordFileMutation(id: number) {
  const invalidate = useInvalidate();
  return useMutation({
    mutationFn: (v: FileInputChoice) => {
      if (v.mode === 'upload') {
        const form = new FormData();
        form.append('kind', v.kind);
        form.append('file', v.file, v.name);
        return api<FileRevision>(`/api/stations/${id}/files`, { form });
      }
      if (v.mode === 'paste') return api<FileRevision>(`/api/stations/${id}/files/paste`, { body: { kind: v.kind, text: v.text } });
      return api<FileRevision>(`/api/stations/${id}/files/none`, { body: { kind: v.kind } });
    },
    onSuccess: invalidate,
  });
}

export function useLinkUserMutation(id: number) {
  const invalidate = useInvalidate();
  return useMutation({
    mutationFn: (v: { version: number; email: string | null }) => api<{ id: number; version: number; linkedUser: boolean }>(`/api/stations/${id}/user`, { method: 'PUT', body: v }),
    onSuccess: invalidate,
  });
}
