import { useSessionQuery } from '@/hooks/use-session';
import { HomeScreen } from '@/components/home/home-screen';

export default function Home() {
  const me = useSessionQuery().data;
  return me ? <HomeScreen me={me} /> : null;
}
