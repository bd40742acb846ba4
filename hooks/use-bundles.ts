// Rollout bundles: the preview of a site, its past bundles, and the download itself (start a build, fetch
// the zip while polling "stations done of total", hand the bytes to the browser, then read how it ended).
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';
import type { BundleStateValue, CreateBundleInput, LeftOutCode } from '@/db/requests/bundles';
import { api, ApiError } from './api-client';
import { planKeys } from './use-plans';

type StationRef = { stationId: number; name: string; number: number; kind: 'pc' | 'printer' | 'modem' | 'other'; location: string };
export type IncludedPc = StationRef & { folder: string; planId: number; revision: number; planHash: string; approvedBy: string; approvedAt: string };
export type LeftOut = StationRef & { code: LeftOutCode; reason: string; planId: number | null; revision: number | null };
export type BundlePreview = { site: { id: number; name: string }; selection: number[] | null; included: IncludedPc[]; leftOut: LeftOut[]; directoryCount: number; survey: boolean };

export type BundleRecord = {
  id: number;
  siteId: number;
  state: BundleStateValue;
  createdAt: string;
  createdBy: { id: string; name: string };
  generatedAt: string;
  finishedAt: string | null;
  plans: Array<{ planId: number; stationId: number; planHash: string; revision?: number; stationName?: string; stationNumber?: number }>;
  selection: number[] | null;
  zipSha256: string | null;
  zipSize: number | null;
  failure: string | null;
  fileName: string;
};

export type BundleProgress = { id: number; state: BundleStateValue; phase: 'checking' | 'sending' | null; done: number; total: number; failure: string | null; zipSha256: string | null };

export const bundleKeys = {
  root: ['bundles'] as const,
  preview: (siteId: number) => [...bundleKeys.root, 'preview', siteId] as const,
  history: (siteId: number) => [...bundleKeys.root, 'history', siteId] as const,
};

export function useBundlePreviewQuery(siteId: number | null) {
  return useQuery({ queryKey: bundleKeys.preview(siteId ?? 0), queryFn: () => api<BundlePreview>(`/api/bundles/preview?siteId=${siteId}`), enabled: !!siteId });
}

export function useBundleHistoryQuery(siteId: number | null) {
  return useQuery({ queryKey: bundleKeys.history(siteId ?? 0), queryFn: () => api<{ items: BundleRecord[] }>(`/api/bundles?siteId=${siteId}`), enabled: !!siteId });
}

export function useCreateBundleMutation() {
  return useMutation({ mutationFn: (v: CreateBundleInput) => api<{ record: BundleRecord; leftOut: number; survey: boolean }>('/api/bundles', { body: v }) });
}

export type DownloadState =
  | { step: 'idle' }
  | { step: 'running'; recordId: number; again: boolean; progress: BundleProgress | null }
  | { step: 'done'; record: BundleRecord; again: boolean }
  | { step: 'failed'; message: string; recordId: number | null };

const POLL_MS = 300;

/** The file name from Content-Disposition, else the record's. */
function fileNameOf(res: Response, fallback: string): string {
  return /filename="([^"]+)"/.exec(res.headers.get('Content-Disposition') ?? '')?.[1] ?? fallback;
}

/** Hands a finished zip to the platform (on the web: a blob and an <a download>). */
export type SaveZip = (blob: Blob, fileName: string) => void;

/** Fetches the zip of a record and saves it; errors come back as ApiError with the server's message. */
async function fetchZip(record: BundleRecord, signal: AbortSignal, saveZip: SaveZip): Promise<void> {
  const res = await fetch(`/api/bundles/${record.id}/zip`, { credentials: 'include', signal });
  if (!res.ok) {
    const data = (await res.json().catch(() => null)) as { error?: { code?: string; message?: string } } | null;
    throw new ApiError(res.status, data?.error?.code ?? 'error', data?.error?.message ?? `The server answered ${res.status}.`);
  }
  saveZip(await res.blob(), fileNameOf(res, record.fileName));
}

/** After the last byte the server records how the download ended; read it (a few tries, it takes a moment). */
async function settled(id: number): Promise<BundleRecord> {
  for (let i = 0; i < 20; i++) {
    const rec = await api<BundleRecord>(`/api/bundles/${id}`);
    if (rec.state !== 'building') return rec;
    await new Promise((r) => setTimeout(r, 150));
  }
  return api<BundleRecord>(`/api/bundles/${id}`);
}

/** Downloads a new bundle (`start`) or a past one again (`again`), with progress and cancel. */
export function useBundleDownload(siteId: number | null, saveZip: SaveZip) {
  const qc = useQueryClient();
  const [state, setState] = useState<DownloadState>({ step: 'idle' });
  const abort = useRef<AbortController | null>(null);
  const poll = useRef<ReturnType<typeof setInterval> | null>(null);

  const stopPolling = () => {
    if (poll.current) clearInterval(poll.current);
    poll.current = null;
  };
  useEffect(() => () => {
    stopPolling();
    abort.current?.abort();
  }, []);

  const run = useCallback(
    async (record: BundleRecord, again: boolean) => {
      const ctrl = new AbortController();
      abort.current = ctrl;
      setState({ step: 'running', recordId: record.id, again, progress: null });
      poll.current = setInterval(() => {
        api<BundleProgress>(`/api/bundles/${record.id}/progress`)
          .then((progress) => setState((s) => (s.step === 'running' && s.recordId === record.id ? { ...s, progress } : s)))
          .catch(() => undefined);
      }, POLL_MS);
      try {
        await fetchZip(record, ctrl.signal, saveZip);
        stopPolling();
        const final = await settled(record.id);
        setState(final.state === 'done' ? { step: 'done', record: final, again } : { step: 'failed', message: final.failure ?? 'The download did not finish.', recordId: record.id });
      } catch (err) {
        stopPolling();
        const cancelled = (err as Error).name === 'AbortError';
        // Let the server record the ending first, so the history shows it when it refreshes.
        const final = await settled(record.id).catch(() => null);
        let message = (err as Error).message;
        if (cancelled && again) message = 'Download cancelled.';
        else if (cancelled && final?.state === 'done') {
          // The server had sent the last byte before the cancel reached it: the bundle counts as downloaded.
          message = `Cancelled too late: the server had already sent the whole zip, so bundle #${record.id} is recorded and its plans are released. Use “Download again” in the history to save it.`;
        } else if (cancelled) message = 'Download cancelled; no plan was released.';
        setState({ step: 'failed', message, recordId: record.id });
      } finally {
        abort.current = null;
        if (siteId) await Promise.all([qc.invalidateQueries({ queryKey: bundleKeys.root }), qc.invalidateQueries({ queryKey: planKeys.root })]);
      }
    },
    [qc, siteId, saveZip],
  );

  const create = useCreateBundleMutation();
  const start = useCallback(
    async (input: CreateBundleInput) => {
      setState({ step: 'running', recordId: 0, again: false, progress: null });
      try {
        const { record } = await create.mutateAsync(input);
        await run(record, false);
      } catch (err) {
        setState({ step: 'failed', message: (err as Error).message, recordId: null });
      }
    },
    [create, run],
  );

  return {
    state,
    start,
    again: (record: BundleRecord) => run(record, true),
    cancel: () => abort.current?.abort(),
    reset: () => setState({ step: 'idle' }),
  };
}
