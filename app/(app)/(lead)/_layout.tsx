import { RoleGate } from '@/components/shell/role-gate';

/** The review: leads decide; admins may read. */
export default function LeadLayout() {
  return <RoleGate roles={['lead', 'admin']} />;
}
