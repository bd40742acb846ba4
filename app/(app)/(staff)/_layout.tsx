import { RoleGate } from '@/components/shell/role-gate';

/** Sites, stations and kits: staff only (leads read, technicians and admins edit). */
export default function StaffLayout() {
  return <RoleGate roles={['admin', 'lead', 'technician']} />;
}
