import { RoleGate } from '@/components/shell/role-gate';

export default function PlansLayout() {
  return <RoleGate roles={['admin', 'lead', 'technician']} />;
}
