import { RoleGate } from '@/components/shell/role-gate';

export default function UserLayout() {
  return <RoleGate roles={['user']} />;
}
