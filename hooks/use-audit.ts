// The audit trail for admins: newest first, filtered, a page at a time.
import { useInfiniteQuery } from '@tanstack/react-query';
import { api } from './api-client';

export type AuditEvent = {
  id: number;
  at: string;
  actorId: string | null;
  actorEmail: string | null;
  action: string;
  entity: string;
  entityId: string | null;
  siteId: number | null;
  details: Record<string, unknown>;
};

export type AuditFilter = { action?: string; entity?: string; actorId?: string; siteId?: number; from?: string; to?: string };

export const AUDIT_PAGE = 50;

export const auditKeys = {
  root: ['audit'] as const,
  list: (f: AuditFilter) => [...auditKeys.root, 'list', f] as const,
};

function queryString(f: AuditFilter, offset: number): string {
  const q = new URLSearchParams({ limit: String(AUDIT_PAGE), offset: String(offset) });
  for (const [k, v] of Object.entries(f)) if (v !== undefined && v !== '') q.set(k, String(v));
  return q.toString();
}

export function useAuditQuery(filter: AuditFilter) {
  return useInfiniteQuery({
    queryKey: auditKeys.list(filter),
    initialPageParam: 0,
    queryFn: ({ pageParam }) => api<{ items: AuditEvent[]; offset: number }>(`/api/audit?${queryString(filter, pageParam)}`),
    getNextPageParam: (last) => (last.items.length === AUDIT_PAGE ? last.offset + AUDIT_PAGE : undefined),
  });
}
