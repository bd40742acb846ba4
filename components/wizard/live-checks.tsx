// The engine's profile checks as the technician types (browser-safe checkProfile, no server round trip).
import { useMemo } from 'react';
import { useWatch, type Control } from 'react-hook-form';
import { checkProfile } from '@/generators/engine/profile-checks';
import type { Kit } from '@/hooks/use-kits';
import { Card } from '@/components/ui/card';
import { Heading, Small } from '@/components/ui/text';
import { ChecksList } from '@/components/stations/checks-list';
import { provisionalProfile, type WizardForm } from './wizard-schema';

export function LiveChecks({ control, kit }: { control: Control<WizardForm>; kit: Kit | null }) {
  const values = useWatch({ control }) as WizardForm;
  const checks = useMemo(() => {
    const profile = provisionalProfile(values, kit);
    return profile ? checkProfile(profile) : null;
  }, [values, kit]);
  return (
    <Card testID="live-checks">
      <Heading>Checks so far</Heading>
      <Small>Worked out from this profile as you type; the startup files add more on the preview.</Small>
      {checks ? <ChecksList checks={checks} testID="live-checks-list" empty="✓ No problem found in the profile." /> : <Small testID="live-checks-waiting">Enter a DOS version and folder to see the checks.</Small>}
    </Card>
  );
}
