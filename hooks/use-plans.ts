// Plan revisions: the board of PCs, one plan's view, making a revision, reasons, sending for review.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { PlanStateValue } from '@/db/requests/plans';
import { api } from './api-client';

export type Severity = 'error' | 'warning' | 'note';
export type Check = { slug: string; severity: Severity; file: 'AUTOEXEC.BAT' | 'CONFIG.SYS' | null; line: number | null; message: string };
export type Change = { file: 'AUTOEXEC.BAT' | 'CONFIG.SYS'; kind: string; line: number; lines: string[]; reason: string };
export type BootStep = { line: number; program: string; args: string; conditional?: boolean };
export type FileJson = { name: 'AUTOEXEC.BAT' | 'CONFIG.SYS'; beforeText: string | null; afterText: string; changed: boolean; diff: string; afterSize: number };

/** The engine's result as the API sends it (no bytes). */
export type PlanResultJson = {
  ok: boolean;
  changed: boolean;
  insertedAt: number | null;
  finalProgram: { line: number; program: string; detected: boolean } | null;
  files: { autoexec: FileJson; config: FileJson | null };
  diff: string;
  changes: Change[];
  checks: Check[];
  boot: { before: BootStep[]; after: BootStep[] };
  sha256: { input: string; output: string; autoexecIn: string | null; autoexecOut: string; configIn: string | null; configOut: string | null };
};

export type StoredResult = PlanResultJson & {
  inputs: { profile: ProfileSummarySource; profileError: string | null; kit: { id: number; name: string } | null; source: 'technician' | 'user' };
};

export type ProfileSummarySource = {
  dos?: string;
  bootDrive?: string;
  dosDir?: string;
  ports?: Array<{ name: string; present: boolean; attached: string }>;
  network?: { port: string; baud: number; parity: string; dataBits: number; stopBits: number };
  redirect?: { from: string; to: string } | null;
  loader?: { path: string; args: string };
  memory?: { freeKB?: number; mainProgramKB?: number };
  finalProgram?: 'auto' | 'none' | number;
};

type Named = { id: string; name: string } | null;
export type Allowed = { ok: boolean; why?: string };
export type PlanComment = { id: number; file: 'AUTOEXEC.BAT' | 'CONFIG.SYS' | null; line: number | null; body: string; createdAt: string; authorId: string; authorName: string; authorRole: string | null };

export type PlanView = {
  plan: {
    id: number;
    stationId: number;
    revision: number;
    state: PlanStateValue;
    createdBy: string;
    createdAt: string;
    submittedAt: string | null;
    decidedAt: string | null;
    decisionComment: string | null;
    profileHash: string;
    kitHash: string;
    autoexecInHash: string | null;
    configInHash: string | null;
    autoexecOutHash: string;
    configOutHash: string | null;
    planHash: string;
    approvedHash: string | null;
    warningReasons: Record<string, string>;
    version: number;
    result: StoredResult;
    stale: boolean;
    changedInputs: string[];
    createdByUser: Named;
    submittedByUser: Named;
    decidedByUser: Named;
  };
  station: { id: number; name: string; number: number; kind: string; location: string };
  site: { id: number; name: string };
  comments: PlanComment[];
  revisions: Array<{ id: number; revision: number; state: PlanStateValue; createdAt: string }>;
  missingReasons: string[];
  allowed: Record<'submit' | 'approve' | 'return' | 'comment' | 'newRevision', Allowed>;
};

export type BoardItem = {
  station: { id: number; name: string; number: number; location: string; siteId: number; siteName: string };
  plan: { id: number; revision: number; state: PlanStateValue; stale: boolean } | null;
};

export const planKeys = {
  root: ['plans'] as const,
  detail: (id: number) => [...planKeys.root, 'detail', id] as const,
  board: (siteId: number | null) => [...planKeys.root, 'board', siteId] as const,
};

export function usePlanQuery(id: number) {
  return useQuery({ queryKey: planKeys.detail(id), queryFn: () => api<PlanView>(`/api/plans/${id}`), enabled: Number.isFinite(id) });
}

export function usePlanBoardQuery(siteId: number | null) {
  return useQuery({
    queryKey: planKeys.board(siteId),
    queryFn: () => api<{ sites: Array<{ id: number; name: string }>; items: BoardItem[] }>(`/api/plans/board${siteId ? `?siteId=${siteId}` : ''}`),
  });
}

/** Invalidates every plan query (board, details, the review queue reads them too). */
export function useInvalidatePlans() {
  const qc = useQueryClient();
  return () => Promise.all([qc.invalidateQueries({ queryKey: planKeys.root }), qc.invalidateQueries({ queryKey: ['review'] }), qc.invalidateQueries({ queryKey: ['my-station'] })]);
}

export function useCreatePlanMutation() {
  const invalidate = useInvalidatePlans();
  return useMutation({ mutationFn: (stationId: number) => api<PlanView>('/api/plans', { body: { stationId } }), onSuccess: invalidate });
}

export function useSaveReasonsMutation(id: number) {
  const invalidate = useInvalidatePlans();
  return useMutation({
    mutationFn: (v: { version: number; reasons: Record<string, string> }) => api<PlanView>(`/api/plans/${id}/reasons`, { method: 'PUT', body: v }),
    onSettled: invalidate,
  });
}

export function useSubmitPlanMutation(id: number) {
  const invalidate = useInvalidatePlans();
  return useMutation({
    mutationFn: (v: { version: number; reasons: Record<string, string> }) => api<PlanView>(`/api/plans/${id}/submit`, { body: v }),
    onSettled: invalidate,
  });
}
