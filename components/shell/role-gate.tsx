import { Slot } from 'expo-router';
import type { Role } from '@/hooks/use-session';
import { useSessionQuery } from '@/hooks/use-session';
import { Banner } from '@/components/ui/banner';
import { Screen } from '@/components/ui/screen';

/** Renders the group's screens only for the given roles; anyone else sees a plain explanation. */
export function RoleGate({ roles }: { roles: Role[] }) {
  const me = useSessionQuery().data;
  if (!me || !roles.includes(me.role)) {
    return (
      <Screen title="Not available">
        <Banner tone="note" testID="role-refused">
          This screen is not part of your role. Use the navigation to reach your own screens.
        </Banner>
      </Screen>
    );
  }
  return <Slot />;
}
