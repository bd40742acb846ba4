// The wiring survey of one site: one query for the whole survey (rows, checks, drawing) and one
// mutation per write; every write refreshes the survey, so the checks follow each change.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { SurveySiteSummary, SurveyView } from '@/db/requests/survey';
import { api } from './api-client';
import type { Role } from './use-session';

export const surveyKeys = {
  root: ['survey'] as const,
  sites: (q: string) => [...surveyKeys.root, 'sites', q] as const,
  site: (siteId: number) => [...surveyKeys.root, 'site', siteId] as const,
};

/** Who may change a survey (the server checks it again): admin and technician; a lead reads. */
export const canEditSurvey = (role: Role | undefined) => role === 'admin' || role === 'technician';

export const surveyPath = (siteId: number) => `/api/sites/${siteId}/survey`;
export const reportUrl = (siteId: number, download = false) => `${surveyPath(siteId)}/report.txt${download ? '?download=1' : ''}`;

export function useSurveySitesQuery(q = '') {
  return useQuery({
    queryKey: surveyKeys.sites(q),
    queryFn: () => api<{ items: SurveySiteSummary[] }>(`/api/survey/sites${q ? `?q=${encodeURIComponent(q)}` : ''}`),
  });
}

export function useSurveyQuery(siteId: number) {
  return useQuery({
    queryKey: surveyKeys.site(siteId),
    queryFn: () => api<SurveyView>(surveyPath(siteId)),
    enabled: Number.isInteger(siteId) && siteId > 0,
  });
}

type Write = { method: 'POST' | 'PATCH' | 'PUT' | 'DELETE'; path: string; body?: unknown };

/** One mutation for every survey write: `path` is below the site's survey, e.g. "runs/12". */
export function useSurveyWrite(siteId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (w: Write) => api<unknown>(`${surveyPath(siteId)}/${w.path}`, { method: w.method, body: w.body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: surveyKeys.root }),
  });
}

/** Helpers naming each write, so screens read as what they do. */
export function surveyWrites(write: ReturnType<typeof useSurveyWrite>['mutateAsync']) {
  const create = (kind: string) => (body: unknown) => write({ method: 'POST', path: kind, body });
  const update = (kind: string) => (id: number, body: unknown) => write({ method: 'PATCH', path: `${kind}/${id}`, body });
  const remove = (kind: string) => (id: number, version: number) => write({ method: 'DELETE', path: `${kind}/${id}?version=${version}` });
  return {
    createJack: create('jacks'), updateJack: update('jacks'), deleteJack: remove('jacks'),
    createReading: (jackId: number, body: unknown) => write({ method: 'POST', path: `jacks/${jackId}/readings`, body }),
    updateReading: update('readings'), deleteReading: remove('readings'),
    createNode: create('nodes'), updateNode: update('nodes'), deleteNode: remove('nodes'),
    createRun: create('runs'), updateRun: update('runs'), deleteRun: remove('runs'),
    createTerminator: create('terminators'), updateTerminator: update('terminators'), deleteTerminator: remove('terminators'),
    updateSettings: (body: unknown) => write({ method: 'PUT', path: 'settings', body }),
  };
}
