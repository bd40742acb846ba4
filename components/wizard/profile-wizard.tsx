// The profile wizard for one PC station: seven steps, one react-hook-form over the zod schema, and the draft
// saved to the server on every step so a reload finds it where it was left.
import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'expo-router';
import { useCallback, useRef, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { View } from 'react-native';
import { space } from '@/constants/theme';
import type { WizardStep } from '@/db/requests/stations';
import { ApiError } from '@/hooks/api-client';
import type { Kit } from '@/hooks/use-kits';
import type { NextNumbers } from '@/hooks/use-sites';
import { usePlanPreviewQuery, useSaveProfileMutation, useUpdateStationMutation, type StationDetail } from '@/hooks/use-stations';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Small } from '@/components/ui/text';
import { PlanPreviewPanel } from '@/components/stations/plan-preview';
import { DosStep } from './dos-step';
import { FilesStep } from './files-step';
import { FinalStep } from './final-step';
import { IdentityForm, type IdentityValues } from './identity-form';
import { LiveChecks } from './live-checks';
import { NetworkStep } from './network-step';
import { PortsStep } from './ports-step';
import { nextStep, prevStep, stepIndex } from './steps';
import { fromDraft, STEP_FIELDS, toDraft, wizardFormSchema, type WizardForm } from './wizard-schema';
import { WizardFrame } from './wizard-frame';

/** `openAt` opens a step already reached (a link to ?step=ports); later steps open at the saved one. */
type Props = { detail: StationDetail; kits: Kit[]; nextNumbers: NextNumbers | null; readOnly: boolean; openAt?: WizardStep };

export function ProfileWizard({ detail, kits, nextNumbers, readOnly, openAt }: Props) {
  const router = useRouter();
  const { station, profile, files } = detail;
  const saved = profile?.wizardStep ?? 'identity';
  const [step, setStep] = useState<WizardStep>(openAt && stepIndex(openAt) <= stepIndex(saved) ? openAt : saved);
  const [reached, setReached] = useState<WizardStep>(profile?.wizardStep ?? 'identity');
  const [version, setVersion] = useState(profile?.version ?? 0);
  const [kitId, setKitId] = useState<number | null>(profile?.kitId ?? null);
  const [savedAt, setSavedAt] = useState<Date | null>(profile ? new Date(profile.updatedAt) : null);
  const [problem, setProblem] = useState<{ message: string; stale?: boolean } | null>(null);
  const [identityFields, setIdentityFields] = useState<Record<string, string>>();
  const kit = kits.find((k) => k.id === kitId) ?? null;
  const save = useSaveProfileMutation(station.id);
  const updateStation = useUpdateStationMutation(station.id);
  // The kit chosen on the identity step, read by the save that follows in the same press.
  const chosenKit = useRef<number | null>(kitId);
  const identitySubmit = useRef<() => Promise<IdentityValues | null>>(async () => null);
  const bindIdentity = useCallback((fn: () => Promise<IdentityValues | null>) => {
    identitySubmit.current = fn;
  }, []);

  const form = useForm<WizardForm>({ resolver: zodResolver(wizardFormSchema), defaultValues: fromDraft(profile?.data ?? {}, kit, station.number), mode: 'onTouched' });
  const { control, trigger, getValues, setValue, setError } = form;
  const values = useWatch({ control }) as WizardForm;
  const finalPreview = usePlanPreviewQuery(station.id, { data: toDraft({ ...values, finalProgram: 'auto' }), kitId }, step === 'final');
  const preview = usePlanPreviewQuery(station.id, undefined, step === 'preview');

  /** Checks the current step; moving back never blocks. */
  async function stepValid(target: WizardStep): Promise<boolean> {
    if (stepIndex(target) < stepIndex(step)) return true;
    if (step === 'identity') return saveIdentity();
    if (step === 'files' && (!files.autoexec || !files.config)) {
      setProblem({ message: 'Record both files first: upload or paste each one, or choose “This machine has none”.' });
      return false;
    }
    if (step === 'final' && getValues('finalProgram') === 'auto' && (finalPreview.data?.plan.candidates.length ?? 0) > 0) {
      setError('finalProgram', { message: 'Confirm the detected line, pick another, or choose “No line keeps the PC”.' });
      return false;
    }
    return trigger(STEP_FIELDS[step]);
  }

  async function saveIdentity(): Promise<boolean> {
    const v = await identitySubmit.current();
    if (!v) return false;
    const changed = v.name !== station.name || Number(v.number) !== station.number || v.location !== station.location;
    chosenKit.current = v.kitId ? Number(v.kitId) : null;
    setKitId(chosenKit.current);
    if (!changed) return true;
    try {
      await updateStation.mutateAsync({ version: station.version, name: v.name, number: Number(v.number), location: v.location });
      return true;
    } catch (err) {
      if (err instanceof ApiError) {
        setIdentityFields(err.fields);
        setProblem({ message: err.message, stale: err.code === 'stale' });
      }
      return false;
    }
  }

  async function goTo(target: WizardStep) {
    setProblem(null);
    if (readOnly) return setStep(target);
    if (!(await stepValid(target))) return;
    const furthest = stepIndex(target) > stepIndex(reached) ? target : reached;
    try {
      const written = await save.mutateAsync({ version, kitId: step === 'identity' ? chosenKit.current : kitId, wizardStep: furthest, data: toDraft(getValues()) });
      setVersion(written.version);
      setSavedAt(new Date(written.updatedAt));
      setReached(furthest);
      setStep(target);
    } catch (err) {
      if (err instanceof ApiError) setProblem({ message: err.message, stale: err.code === 'stale' });
    }
  }

  const side = step === 'dos' || step === 'ports' || step === 'network' ? <LiveChecks control={control} kit={kit} /> : undefined;
  const footer = (
    <>
      {step === 'identity' ? <View /> : <Button variant="secondary" label="← Back" testID="wizard-back" onPress={() => goTo(prevStep(step))} />}
      {step === 'preview' ? (
        <Button label="Done: back to the site" testID="wizard-done" onPress={() => router.push(`/sites/${station.siteId}` as never)} />
      ) : (
        <Button label={readOnly ? 'Next →' : 'Save and continue →'} testID="wizard-next" busy={save.isPending || updateStation.isPending} onPress={() => goTo(nextStep(step))} />
      )}
    </>
  );
  const status = (
    <View style={{ gap: space.sm }}>
      {readOnly ? <Banner tone="note" testID="wizard-read-only">You can read this profile; technicians and admins change it.</Banner> : null}
      {problem ? (
        <Banner tone="error" title={problem.stale ? 'Changed by someone else' : 'Not saved'} testID="wizard-problem">
          {problem.stale ? `${problem.message} Reload the page to see the newer version.` : problem.message}
        </Banner>
      ) : null}
      {savedAt && !readOnly ? <Small testID="draft-saved">{`✓ Draft saved ${savedAt.toLocaleTimeString()}`}</Small> : null}
    </View>
  );

  return (
    <WizardFrame fullWidth={step === 'final' || step === 'preview'} step={step} reached={reached} onPick={goTo} side={side} status={status} footer={footer}>
      {step === 'identity' ? (
        <IdentityForm
          kind="pc"
          kits={kits}
          nextNumber={nextNumbers?.pc ?? null}
          range={detail.site.numberRanges.pc}
          disabled={readOnly}
          serverFields={identityFields}
          bindSubmit={bindIdentity}
          defaults={{ name: station.name, number: String(station.number), location: station.location, kitId: kitId ? String(kitId) : '' }}
        />
      ) : null}
      {step === 'dos' ? <DosStep control={control} kit={kit} readOnly={readOnly} /> : null}
      {step === 'ports' ? <PortsStep control={control} readOnly={readOnly} /> : null}
      {step === 'network' ? <NetworkStep
          control={control}
          kit={kit}
          readOnly={readOnly}
          onUseKit={(k) => {
            for (const [name, value] of [['baud', k.baud], ['parity', k.parity], ['dataBits', k.dataBits], ['stopBits', k.stopBits]] as const) setValue(name, value as never, { shouldDirty: true });
          }}
        /> : null}
      {step === 'files' ? <FilesStep stationId={station.id} files={files} readOnly={readOnly} onRecorded={(k) => k === 'AUTOEXEC.BAT' && setValue('finalProgram', 'auto')} /> : null}
      {step === 'final' ? <FinalStep control={control} preview={finalPreview.data} loading={finalPreview.isFetching} readOnly={readOnly} /> : null}
      {step === 'preview' ? preview.data ? <PlanPreviewPanel preview={preview.data} loaderPath={kit?.programPath} /> : preview.isError ? <Banner tone="error">{(preview.error as Error).message}</Banner> : <Small>Computing the plan…</Small> : null}
    </WizardFrame>
  );
}
