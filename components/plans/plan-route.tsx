// Loads the plan revision named by the route's [id] and shows loading or the error; the technician's plan
// screen and the lead's review screen render the loaded view.
import { useLocalSearchParams } from 'expo-router';
import type { ReactNode } from 'react';
import { usePlanQuery, type PlanView } from '@/hooks/use-plans';
import { Banner } from '@/components/ui/banner';
import { Screen } from '@/components/ui/screen';
import { FullScreenLoading } from '@/components/shell/loading';

export function PlanRoute({ title, children }: { title: string; children: (view: PlanView) => ReactNode }) {
  const { id } = useLocalSearchParams<{ id: string }>();
  const query = usePlanQuery(Number(id));
  if (query.isPending) return <FullScreenLoading />;
  if (query.isError) {
    return (
      <Screen title={title}>
        <Banner tone="error">{(query.error as Error).message}</Banner>
      </Screen>
    );
  }
  return <>{children(query.data)}</>;
}
