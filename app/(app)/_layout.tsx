import { Redirect, Slot } from 'expo-router';
import { useSessionQuery } from '@/hooks/use-session';
import { AppShell } from '@/components/shell/app-shell';
import { FullScreenLoading } from '@/components/shell/loading';

/** Every signed-in screen: a signed-out visitor is sent to sign-in. */
export default function AppLayout() {
  const session = useSessionQuery();
  if (session.isPending) return <FullScreenLoading />;
  if (!session.data) return <Redirect href="/sign-in" />;
  return (
    <AppShell me={session.data}>
      <Slot />
    </AppShell>
  );
}
