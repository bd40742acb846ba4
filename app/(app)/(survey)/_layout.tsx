import { RoleGate } from '@/components/shell/role-gate';
import { STAFF } from '@/server/roles';

/** The wiring survey: staff read it (admin and technician edit; the server checks each write). */
export default function SurveyLayout() {
  return <RoleGate roles={STAFF} />;
}
