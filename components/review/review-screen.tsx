// The lead's review of one plan revision: the diff with the engine's reason for each changed block, the
// checks with the technician's reasons, the boot order before and after, the profile; comments on lines;
// approve the exact plan hash shown or return it. A 409 shows the fresh view with a note.
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { checkKey } from '@/db/requests/plans';
import { colors, space } from '@/constants/theme';
import { ApiError } from '@/hooks/api-client';
import { type PlanView } from '@/hooks/use-plans';
import { useApproveMutation, useCommentMutation, useReturnMutation } from '@/hooks/use-review';
import { Banner } from '@/components/ui/banner';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { Body, Heading, Mono, Small } from '@/components/ui/text';
import { BootPreview } from '@/components/plans/boot-preview';
import { ChecksList } from '@/components/plans/checks-list';
import { CommentsList } from '@/components/plans/comments-list';
import { DecisionNote, FileDownloads, Hashes, PlanFacts, RevisionLinks, StaleBanner } from '@/components/plans/plan-header';
import { PlanRoute } from '@/components/plans/plan-route';
import { PlanDiffs } from '@/components/plans/plan-diffs';
import { ProfileSummary } from '@/components/plans/profile-summary';
import { CommentForm } from './comment-form';
import { DecisionForm } from './decision-form';

type FileName = 'AUTOEXEC.BAT' | 'CONFIG.SYS';

export function ReviewScreen() {
  return <PlanRoute title="Review">{(view) => <ReviewBody view={view} />}</PlanRoute>;
}

function ReviewBody({ view }: { view: PlanView }) {
  const p = view.plan;
  const [active, setActive] = useState<{ file: FileName; line: number } | null>(null);
  const comment = useCommentMutation(p.id);
  const approve = useApproveMutation(p.id);
  const ret = useReturnMutation(p.id);
  const decisionError = (approve.error ?? ret.error) as ApiError | null;
  const canComment = view.allowed.comment.ok;
  const open = p.state === 'in_review';
  return (
    <Screen title={`Review · ${view.station.name} revision ${p.revision}`} subtitle={`${view.site.name} · station ${view.station.number}${view.station.location ? ` · ${view.station.location}` : ''}`}>
      <PlanFacts view={view} />
      <StaleBanner view={view} />
      {decisionError ? (
        <Banner tone={decisionError.status === 409 ? 'warning' : 'error'} title={decisionError.status === 409 ? 'Shown fresh' : 'Not done'} testID="decision-error">
          {decisionError.message}
        </Banner>
      ) : null}
      {approve.isSuccess ? <Banner tone="success" testID="approved-banner">Approved. The technician was told by mail.</Banner> : null}
      {ret.isSuccess ? <Banner tone="success" testID="returned-banner">Returned. The technician was told by mail.</Banner> : null}
      <DecisionNote view={view} />
      <RevisionLinks view={view} base="/review" />
      <Card>
        <Heading>Changes</Heading>
        {canComment ? <Small>Press a line of the new file to comment on it.</Small> : null}
        <PlanDiffs
          result={p.result}
          comments={view.comments}
          active={active}
          onPressLine={canComment ? (file, line) => setActive((a) => (a?.file === file && a.line === line ? null : { file, line })) : undefined}
          activeSlot={
            active ? (
              <CommentForm
                label={`Comment on ${active.file}, line ${active.line}`}
                testID="line-comment"
                busy={comment.isPending}
                onCancel={() => setActive(null)}
                onSubmit={(body) => comment.mutateAsync({ file: active.file, line: active.line, body }).then(() => setActive(null))}
              />
            ) : null
          }
        />
        {comment.error ? <Banner tone="error">{(comment.error as Error).message}</Banner> : null}
      </Card>
      <Card>
        <Heading>Checks and the technician's reasons</Heading>
        <ChecksList
          checks={p.result.checks}
          renderReason={(c) => (
            <Body style={styles.reason} testID={`tech-reason-${c.slug}`}>
              Technician's reason: {p.warningReasons[checkKey(c)] ?? '— none given'}
            </Body>
          )}
        />
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
          {canComment ? <CommentForm label="Comment on the whole plan" testID="plan-comment" busy={comment.isPending} onSubmit={(body) => comment.mutateAsync({ body })} /> : null}
        </Card>
      </View>
      <Card testID="decision-card">
        <Heading>Decision</Heading>
        {open ? (
          <>
            <Small>Your approval holds for exactly this content:</Small>
            <Mono testID="approving-hash">plan {p.planHash}</Mono>
            <DecisionForm
              key={p.version}
              approve={view.allowed.approve}
              ret={view.allowed.return}
              busy={approve.isPending || ret.isPending}
              onApprove={(c) => approve.mutate({ version: p.version, planHash: p.planHash, ...(c ? { comment: c } : {}) })}
              onReturn={(c) => ret.mutate({ version: p.version, comment: c })}
            />
          </>
        ) : (
          <Body>This revision is not waiting for review.</Body>
        )}
      </Card>
      <Card>
        <Heading>Hashes</Heading>
        <Hashes view={view} />
        <FileDownloads view={view} />
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({
  reason: { color: colors.text },
  two: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  cell: { flexGrow: 1, flexBasis: 320 },
});
