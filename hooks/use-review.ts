// The lead's review: the queue and the decisions. A 409 (another lead was first, or the station changed)
// refetches the plan so the screen shows the fresh view.
import { useMutation, useQuery } from '@tanstack/react-query';
import type { CommentInput } from '@/db/requests/plans';
import { api } from './api-client';
import { useInvalidatePlans, type PlanComment, type PlanView } from './use-plans';

export type QueueItem = {
  id: number;
  stationId: number;
  revision: number;
  stationName: string;
  stationNumber: number;
  siteId: number;
  siteName: string;
  createdByName: string;
  submittedByName: string;
  submittedAt: string | null;
  warnings: number;
  notes: number;
  stale: boolean;
};

export const reviewKeys = {
  root: ['review'] as const,
  queue: (siteId: number | null) => [...reviewKeys.root, 'queue', siteId] as const,
};

export function useReviewQueueQuery(siteId: number | null) {
  return useQuery({
    queryKey: reviewKeys.queue(siteId),
    queryFn: () => api<{ items: QueueItem[]; sites: Array<{ id: number; name: string; waiting: number }> }>(`/api/review/queue${siteId ? `?siteId=${siteId}` : ''}`),
  });
}

export function useApproveMutation(id: number) {
  const invalidate = useInvalidatePlans();
  return useMutation({
    mutationFn: (v: { version: number; planHash: string; comment?: string }) => api<PlanView>(`/api/plans/${id}/approve`, { body: v }),
    onSettled: invalidate,
  });
}

export function useReturnMutation(id: number) {
  const invalidate = useInvalidatePlans();
  return useMutation({
    mutationFn: (v: { version: number; comment: string }) => api<PlanView>(`/api/plans/${id}/return`, { body: v }),
    onSettled: invalidate,
  });
}

export function useCommentMutation(id: number) {
  const invalidate = useInvalidatePlans();
  return useMutation({ mutationFn: (v: CommentInput) => api<PlanComment>(`/api/plans/${id}/comments`, { body: v }), onSuccess: invalidate });
}
