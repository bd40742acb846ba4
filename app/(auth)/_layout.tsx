import { Redirect, Slot } from 'expo-router';
import { useSessionQuery } from '@/hooks/use-session';
import { FullScreenLoading } from '@/components/shell/loading';

export default function AuthLayout() {
  const session = useSessionQuery();
  if (session.isPending) return <FullScreenLoading />;
  if (session.data) return <Redirect href="/" />;
  return <Slot />;
}
