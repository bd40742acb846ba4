// Sites and their station directory import/export: one key root, a key factory, query and mutation hooks.
import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Page } from '@/db/requests/common';
import type { CsvImportInput, ImportPreviewResult, SiteCreateInput, SiteSummary, SiteUpdateInput, StationKind } from '@/db/requests/sites';
import { api } from './api-client';
import { stationKeys } from './use-stations';

export type NextNumbers = Record<StationKind, number | null>;
export type Site = Omit<SiteSummary, 'stations'> & { nextNumbers: NextNumbers };
export type SiteListParams = { sort?: string; dir?: 'asc' | 'desc'; q?: string; archived?: boolean; limit?: number; offset?: number };

export const siteKeys = {
  root: ['sites'] as const,
  list: (p: SiteListParams) => [...siteKeys.root, 'list', p] as const,
  one: (id: number) => [...siteKeys.root, 'one', id] as const,
};

export function toQueryString(p: Record<string, string | number | boolean | undefined | null>): string {
  const parts = Object.entries(p)
    .filter(([, v]) => v !== undefined && v !== null && v !== '')
    .map(([k, v]) => `${encodeURIComponent(k)}=${encodeURIComponent(String(v))}`);
  return parts.length ? `?${parts.join('&')}` : '';
}

export function useSitesQuery(p: SiteListParams = {}) {
  return useQuery({
    queryKey: siteKeys.list(p),
    queryFn: () => api<Page<SiteSummary>>(`/api/sites${toQueryString(p)}`),
    placeholderData: keepPreviousData,
  });
}

export function useSiteQuery(id: number) {
  return useQuery({ queryKey: siteKeys.one(id), queryFn: () => api<Site>(`/api/sites/${id}`), enabled: id > 0 });
}

function useInvalidateSites() {
  const qc = useQueryClient();
  return () => Promise.all([qc.invalidateQueries({ queryKey: siteKeys.root }), qc.invalidateQueries({ queryKey: stationKeys.root })]);
}

export function useCreateSiteMutation() {
  const invalidate = useInvalidateSites();
  return useMutation({ mutationFn: (v: SiteCreateInput) => api<Site>('/api/sites', { body: v }), onSuccess: invalidate });
}

export function useUpdateSiteMutation(id: number) {
  const invalidate = useInvalidateSites();
  return useMutation({ mutationFn: (v: SiteUpdateInput) => api<Site>(`/api/sites/${id}`, { method: 'PATCH', body: v }), onSuccess: invalidate });
}

export function useArchiveSiteMutation(id: number) {
  const invalidate = useInvalidateSites();
  return useMutation({
    mutationFn: (v: { version: number; archived: boolean }) => api<Site>(`/api/sites/${id}/${v.archived ? 'archive' : 'restore'}`, { body: { version: v.version } }),
    onSuccess: invalidate,
  });
}

export function useImportPreviewMutation(siteId: number) {
  return useMutation({ mutationFn: (v: CsvImportInput) => api<ImportPreviewResult>(`/api/sites/${siteId}/import/preview`, { body: v }) });
}

export function useImportMutation(siteId: number) {
  const invalidate = useInvalidateSites();
  return useMutation({
    mutationFn: (v: CsvImportInput) => api<{ created: Array<{ id: number; name: string; number: number }> }>(`/api/sites/${siteId}/import`, { body: v }),
    onSuccess: invalidate,
  });
}

export const siteExportUrl = (siteId: number) => `/api/sites/${siteId}/export.csv`;
