// The office user's own PC: what we have on record, their pasted or uploaded files checked against it
// (diff, checks in plain words, what runs at boot), and sending them to the technician.
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { userEditRequest, type UserEditForm as Values, type UserEditInput } from '@/db/requests/plans';
import { space } from '@/constants/theme';
import { ApiError } from '@/hooks/api-client';
import { useCheckEditMutation, useMyStationQuery, useSendEditMutation, type MyStation } from '@/hooks/use-my-station';
import type { PlanResultJson } from '@/hooks/use-plans';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { Body, Heading, Small } from '@/components/ui/text';
import { FullScreenLoading } from '@/components/shell/loading';
import { BootPreview } from '@/components/plans/boot-preview';
import { ChecksList } from '@/components/plans/checks-list';
import { PlanDiffs } from '@/components/plans/plan-diffs';
import { UserEditForm } from './user-edit-form';

const PLAN_WORDS: Record<string, string> = {
  draft: 'Your technician is preparing the change.',
  in_review: 'A lead is reviewing the change.',
  approved: 'The change is approved and waits to be installed.',
  returned: 'A lead asked the technician for changes.',
  released: 'The change has been handed out for installation.',
  superseded: 'An older change was replaced by a newer one.',
};

export function MyStationScreen() {
  const query = useMyStationQuery();
  if (query.isPending) return <FullScreenLoading />;
  if (query.isError) {
    return (
      <Screen title="My PC">
        <Banner tone="error">{(query.error as Error).message}</Banner>
      </Screen>
    );
  }
  if (!query.data.station) {
    return (
      <Screen title="My PC">
        <Banner tone="note" testID="no-station">
          No PC is linked to your account yet. Ask your admin to link your station.
        </Banner>
      </Screen>
    );
  }
  return <Mine data={query.data} />;
}

function Mine({ data }: { data: Extract<MyStation, { site: unknown }> }) {
  const check = useCheckEditMutation(data.station.id);
  const send = useSendEditMutation(data.station.id);
  const [checked, setChecked] = useState<{ input: UserEditInput; result: PlanResultJson } | null>(null);
  const onCheck = (v: Values) => {
    const input = userEditRequest(v);
    send.reset();
    check.mutate(input, { onSuccess: (r) => setChecked({ input, result: r.result }) });
  };
  const checkError = check.error as ApiError | null;
  const plan = data.latestPlan;
  return (
    <Screen title={`My PC: ${data.station.name}`} subtitle={`${data.site.name} · station ${data.station.number}${data.station.location ? ` · ${data.station.location}` : ''}`}>
      <Banner tone="caution" title="Nothing on your PC changes here">
        This page only shows what the change would be. Your technician installs it and keeps a copy of your old files, so the PC can go back to how it started. Do not edit your startup files yourself: a mistake there can stop the PC from starting.
      </Banner>
      <Card>
        <Heading>On record</Heading>
        <Body>
          DOS {data.profile.dos ?? 'not recorded'} · network adapter on {data.profile.network ?? 'no port yet'} · kit {data.profile.kit ?? 'not chosen'}
        </Body>
        {plan ? <Body testID="my-plan-state">{PLAN_WORDS[plan.state]}{plan.current ? '' : ' Your files changed since, so it will be planned again.'}</Body> : <Small>No change has been planned for your PC yet.</Small>}
      </Card>
      <Card>
        <Heading>Your startup files</Heading>
        <UserEditForm onSubmit={onCheck} busy={check.isPending} onRecord={{ autoexec: data.files.autoexec.text, config: data.files.config.text }} serverFields={checkError?.fields} />
        {checkError ? <Banner tone="error">{checkError.message}</Banner> : null}
        {checked && !check.isPending ? <CheckedSummary result={checked.result} /> : null}
      </Card>
      {checked ? <Checked result={checked.result} sending={send.isPending} sent={send.data ?? null} error={send.error as ApiError | null} onSend={() => send.mutate(checked.input)} /> : null}
    </Screen>
  );
}

/** Right under the button, so a phone shows that the check ran; the details follow below. */
function CheckedSummary({ result }: { result: PlanResultJson }) {
  const count = (sev: string) => result.checks.filter((c) => c.severity === sev).length;
  const added = result.changes.reduce((n, c) => n + c.lines.length, 0);
  const errors = count('error');
  return (
    <Banner tone={errors ? 'error' : 'success'} title="Checked" testID="checked-summary">
      {`${added} line${added === 1 ? '' : 's'} would change. ${errors} problem${errors === 1 ? '' : 's'}, ${count('warning')} warning${count('warning') === 1 ? '' : 's'}, ${count('note')} note${count('note') === 1 ? '' : 's'}. The details follow below.`}
    </Banner>
  );
}

type CheckedProps = { result: PlanResultJson; sending: boolean; sent: { revision: number; stored: string[] } | null; error: ApiError | null; onSend: () => void };

function Checked({ result, sending, sent, error, onSend }: CheckedProps) {
  const errors = result.checks.filter((c) => c.severity === 'error').length;
  return (
    <View style={styles.gap} testID="checked-edit">
      <Card>
        <Heading>What would change</Heading>
        <Small>Lines marked + would be added, lines marked - taken out (old lines are kept as REM remarks, never deleted).</Small>
        <PlanDiffs result={result} />
      </Card>
      <Card>
        <Heading>What we checked</Heading>
        <ChecksList checks={result.checks} plain testID="user-checks" />
      </Card>
      <Card>
        <Heading>What will run when the PC starts</Heading>
        <BootPreview before={result.boot.before} after={result.boot.after} />
      </Card>
      <Card>
        <Heading>Send to your technician</Heading>
        <Body>
          Your files are stored with your PC's record and your technician is told by mail. They check the change, and a lead reviews it before anything is installed.
          {errors ? ' Some checks found problems; the technician will look at them with you.' : ''}
        </Body>
        {sent ? (
          <Banner tone="success" title="Sent" testID="sent-banner">
            {sent.stored.length ? `${sent.stored.join(' and ')} stored.` : 'Your files were already on record.'} Your technician was told and will prepare revision {sent.revision} of the change.
          </Banner>
        ) : (
          <View style={styles.row}>
            <Button label="Send to the technician" testID="send-files" busy={sending} onPress={onSend} />
          </View>
        )}
        {error ? <Banner tone="error">{error.message}</Banner> : null}
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  gap: { gap: space.lg },
  row: { flexDirection: 'row' },
});
