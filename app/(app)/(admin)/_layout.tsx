import { RoleGate } from '@/components/shell/role-gate';

export default function AdminLayout() {
  return <RoleGate roles={['admin']} />;
}
