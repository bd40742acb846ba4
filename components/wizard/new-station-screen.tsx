// /sites/:id/new-station?kind=pc: the identity step for a new station. A PC goes on into the profile wizard;
// a printer, modem or other device is done once it has its name and number.
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useCallback, useRef, useState } from 'react';
import { ActivityIndicator, View } from 'react-native';
import { space } from '@/constants/theme';
import { KIND_LABELS, STATION_KINDS, type StationKind } from '@/db/requests/sites';
import { ApiError } from '@/hooks/api-client';
import { useKitsQuery } from '@/hooks/use-kits';
import { useSiteQuery } from '@/hooks/use-sites';
import { useCreateStationMutation } from '@/hooks/use-stations';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Choice } from '@/components/ui/choice';
import { Screen } from '@/components/ui/screen';
import { IdentityForm, type IdentityValues } from './identity-form';
import { WizardFrame } from './wizard-frame';

export function NewStationScreen() {
  const params = useLocalSearchParams<{ id: string; kind?: string }>();
  const siteId = Number(params.id) || 0;
  const [kind, setKind] = useState<StationKind>((STATION_KINDS as readonly string[]).includes(params.kind ?? '') ? (params.kind as StationKind) : 'pc');
  const site = useSiteQuery(siteId);
  const kits = useKitsQuery();
  const create = useCreateStationMutation();
  const router = useRouter();
  const submit = useRef<() => Promise<IdentityValues | null>>(async () => null);
  const bind = useCallback((fn: () => Promise<IdentityValues | null>) => {
    submit.current = fn;
  }, []);
  const error = create.error instanceof ApiError ? create.error : null;

  async function onCreate() {
    const v = await submit.current();
    if (!v) return;
    try {
      const st = await create.mutateAsync({ siteId, kind, name: v.name, number: Number(v.number), location: v.location, kitId: kind === 'pc' && v.kitId ? Number(v.kitId) : null });
      router.replace((kind === 'pc' ? `/stations/${st.id}/wizard` : `/sites/${siteId}`) as never);
    } catch {
      // Shown from create.error.
    }
  }

  const s = site.data;
  const firstKit = kits.data?.items[0];
  const form =
    s && kits.data ? (
      <IdentityForm
        key={kind}
        kind={kind}
        kits={kits.data.items}
        nextNumber={s.nextNumbers[kind]}
        range={s.numberRanges[kind]}
        serverFields={error?.fields}
        bindSubmit={bind}
        defaults={{ name: '', number: s.nextNumbers[kind] !== null ? String(s.nextNumbers[kind]) : '', location: '', kitId: firstKit ? String(firstKit.id) : '' }}
      />
    ) : (
      <ActivityIndicator />
    );
  const footer = (
    <>
      <Button variant="secondary" label="Cancel" testID="new-station-cancel" onPress={() => router.back()} />
      <Button label={kind === 'pc' ? 'Create and continue →' : `Add ${KIND_LABELS[kind].toLowerCase()}`} testID="wizard-next" busy={create.isPending} onPress={onCreate} />
    </>
  );
  const status = (
    <View style={{ gap: space.md }}>
      <Choice label="Kind of station" testID="new-station-kind" value={kind} onChange={setKind} options={STATION_KINDS.map((k) => ({ value: k, label: KIND_LABELS[k] }))} />
      {error ? (
        <Banner tone="error" title="Not created" testID="new-station-error">
          {error.message}
        </Banner>
      ) : null}
    </View>
  );
  return (
    <Screen title={kind === 'pc' ? 'New PC' : `New ${KIND_LABELS[kind].toLowerCase()}`} subtitle={s ? s.name : undefined} width={1240} testID="new-station-screen">
      <WizardFrame step="identity" reached="identity" onPick={() => undefined} showSteps={kind === 'pc'} status={status} footer={footer}>
        {form}
      </WizardFrame>
    </Screen>
  );
}
