import type { ComponentType } from 'react';
import { ROLE_LABELS } from '@/constants/navigation';
import type { Me, Role } from '@/hooks/use-session';
import { Screen } from '@/components/ui/screen';
import { AdminHome } from './admin-home';
import { LeadHome } from './lead-home';
import { TechnicianHome } from './technician-home';
import { UserHome } from './user-home';

const HOMES: Record<Role, ComponentType<{ me: Me }>> = {
  admin: AdminHome,
  lead: LeadHome,
  technician: TechnicianHome,
  user: UserHome,
};

/** Each role's own home: what that person does next. */
export function HomeScreen({ me }: { me: Me }) {
  const Home = HOMES[me.role];
  return (
    <Screen title={`Hello, ${me.name.split(' ')[0]}`} subtitle={`Signed in as ${ROLE_LABELS[me.role]}`} testID={`home-${me.role}`}>
      <Home me={me} />
    </Screen>
  );
}
