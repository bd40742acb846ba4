// The technician's view of one plan revision: the diff with the engine's reasons and the lead's comments,
// the checks with a reason for each warning, send for review, make a new revision.
import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { checkKey } from '@/db/requests/plans';
import { space } from '@/constants/theme';
import { ApiError } from '@/hooks/api-client';
import { useCreatePlanMutation, useSaveReasonsMutation, useSubmitPlanMutation, type PlanView } from '@/hooks/use-plans';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { Body, Heading } from '@/components/ui/text';
import { BootPreview } from './boot-preview';
import { ChecksList } from './checks-list';
import { CommentsList } from './comments-list';
import { DecisionNote, FileDownloads, Hashes, PlanFacts, RevisionLinks, StaleBanner } from './plan-header';
import { PlanRoute } from './plan-route';
import { PlanDiffs } from './plan-diffs';
import { ProfileSummary } from './profile-summary';
import { SubmitForm } from './submit-form';

export function PlanScreen() {
  return <PlanRoute title="Plan">{(view) => <PlanBody view={view} />}</PlanRoute>;
}

function PlanBody({ view }: { view: PlanView }) {
  const p = view.plan;
  const router = useRouter();
  const create = useCreatePlanMutation();
  const newRevision = () => create.mutate(view.station.id, { onSuccess: (v) => router.replace(`/plans/${v.plan.id}`) });
  return (
    <Screen
      title={`${view.station.name} · plan revision ${p.revision}`}
      subtitle={`${view.site.name} · station ${view.station.number}${view.station.location ? ` · ${view.station.location}` : ''}`}
      actions={view.allowed.newRevision.ok ? <Button variant="secondary" label="Make a new revision" testID="new-revision" busy={create.isPending} onPress={newRevision} /> : null}
    >
      <PlanFacts view={view} />
      {create.error ? <Banner tone="error">{(create.error as Error).message}</Banner> : null}
      <StaleBanner view={view} />
      <DecisionNote view={view} />
      <RevisionLinks view={view} base="/plans" />
      <Card>
        <Heading>Changes</Heading>
        <PlanDiffs result={p.result} comments={view.comments} />
      </Card>
      <Card>
        <Heading>Checks</Heading>
        {p.state === 'draft' && view.allowed.newRevision.ok ? <DraftChecks key={p.version} view={view} /> : <ChecksList checks={p.result.checks} renderReason={(c) => <Body>Reason: {p.warningReasons[checkKey(c)] ?? '—'}</Body>} />}
      </Card>
      <Card>
        <Heading>Boot order</Heading>
        <BootPreview before={p.result.boot.before} after={p.result.boot.after} />
      </Card>
      <View style={styles.two}>
        <Card style={styles.cell}>
          <Heading>Profile</Heading>
          <ProfileSummary profile={p.result.inputs.profile} kit={p.result.inputs.kit?.name ?? null} error={p.result.inputs.profileError} />
        </Card>
        <Card style={styles.cell}>
          <Heading>Comments</Heading>
          <CommentsList comments={view.comments} />
        </Card>
      </View>
      <Card>
        <Heading>Hashes</Heading>
        <Hashes view={view} />
        <FileDownloads view={view} />
      </Card>
    </Screen>
  );
}

function DraftChecks({ view }: { view: PlanView }) {
  const p = view.plan;
  const save = useSaveReasonsMutation(p.id);
  const submit = useSubmitPlanMutation(p.id);
  const error = (submit.error ?? save.error) as ApiError | null;
  return (
    <View style={styles.gap}>
      {!view.allowed.submit.ok ? <Banner tone="error" title="Cannot be sent for review" testID="submit-blocked">{view.allowed.submit.why ?? ''}</Banner> : null}
      {error ? <Banner tone="error" testID="submit-error">{error.message}</Banner> : null}
      {save.isSuccess && !submit.isPending ? <Banner tone="success" testID="reasons-saved">Reasons saved.</Banner> : null}
      <SubmitForm
        checks={p.result.checks}
        saved={p.warningReasons}
        busy={save.isPending || submit.isPending}
        blocked={view.allowed.submit.ok ? null : view.allowed.submit.why ?? 'blocked'}
        serverFields={error?.fields}
        onSave={(reasons) => save.mutate({ version: p.version, reasons })}
        onSubmit={(reasons) => submit.mutate({ version: p.version, reasons })}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  gap: { gap: space.md },
  two: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  cell: { flexGrow: 1, flexBasis: 320 },
});
