// The top of a plan: which station and revision, its state, who made, sent and decided it, the stale
// warning with what changed, and the hashes the approval pins.
import { Link } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, space } from '@/constants/theme';
import type { PlanView } from '@/hooks/use-plans';
import { Banner } from '@/components/ui/banner';
import { Small } from '@/components/ui/text';
import { PlanStateBadge } from './plan-state-badge';

const when = (s: string | null) => (s ? new Date(s).toLocaleString() : null);
const short = (h: string | null) => (h ? `${h.slice(0, 12)}…` : 'none');

export function PlanFacts({ view }: { view: PlanView }) {
  const p = view.plan;
  const made = p.result.inputs?.source === 'user' ? ' from the file the office user sent' : '';
  return (
    <View style={styles.facts}>
      <PlanStateBadge state={p.state} stale={p.stale} />
      <Small>
        Revision {p.revision} · made by {p.createdByUser?.name ?? 'unknown'}{made} on {when(p.createdAt)}
        {p.submittedByUser ? ` · sent by ${p.submittedByUser.name} on ${when(p.submittedAt)}` : ''}
        {p.decidedByUser ? ` · ${p.state === 'returned' ? 'returned' : 'decided'} by ${p.decidedByUser.name} on ${when(p.decidedAt)}` : ''}
      </Small>
    </View>
  );
}

export function StaleBanner({ view }: { view: PlanView }) {
  if (!view.plan.stale) return null;
  return (
    <Banner tone="error" title={view.plan.state === 'approved' ? 'Approval no longer holds' : 'The station changed'} testID="stale-banner">
      {`The station's ${view.plan.changedInputs.join(', ')} changed after this revision was made. It cannot go into a rollout bundle; make a new revision and have it reviewed.`}
    </Banner>
  );
}

export function DecisionNote({ view }: { view: PlanView }) {
  const p = view.plan;
  if (!p.decisionComment || !p.decidedByUser) return null;
  return (
    <Banner tone={p.state === 'returned' ? 'warning' : 'success'} title={p.state === 'returned' ? `Returned by ${p.decidedByUser.name}` : `Approved by ${p.decidedByUser.name}`} testID="decision-note">
      {p.decisionComment}
    </Banner>
  );
}

export function Hashes({ view }: { view: PlanView }) {
  const p = view.plan;
  const rows: Array<[string, string | null]> = [
    ['Plan', p.planHash],
    ['Approved', p.approvedHash],
    ['Profile', p.profileHash],
    ['Kit', p.kitHash],
    ['AUTOEXEC.BAT in', p.autoexecInHash],
    ['AUTOEXEC.BAT out', p.autoexecOutHash],
    ['CONFIG.SYS in', p.configInHash],
    ['CONFIG.SYS out', p.configOutHash],
  ];
  return (
    <View style={styles.hashes} testID="plan-hashes">
      {rows.map(([label, h]) => (
        <Text key={label} style={styles.hash}>
          <Text style={styles.hashLabel}>{label.padEnd(18, ' ')}</Text>
          {short(h)}
        </Text>
      ))}
    </View>
  );
}

/** Links to the patched files as the plan holds them (the download is recorded in the audit trail). */
export function FileDownloads({ view }: { view: PlanView }) {
  const names = ['AUTOEXEC.BAT', ...(view.plan.configOutHash ? ['CONFIG.SYS'] : [])];
  return (
    <View style={styles.revs}>
      <Small>Patched files:</Small>
      {names.map((n) => (
        // react-native-web renders a Text with href as a plain link, so the browser downloads the bytes.
        <Text key={n} style={styles.revLink} testID={`download-${n}`} {...({ href: `/api/plans/${view.plan.id}/files/${n}`, hrefAttrs: { download: n } } as object)}>
          ⤓ {n}
        </Text>
      ))}
    </View>
  );
}

export function RevisionLinks({ view, base }: { view: PlanView; base: '/plans' | '/review' }) {
  if (view.revisions.length < 2) return null;
  return (
    <View style={styles.revs}>
      <Small>Revisions:</Small>
      {view.revisions.map((r) =>
        r.id === view.plan.id ? (
          <Text key={r.id} style={styles.revCurrent}>
            {r.revision} (this)
          </Text>
        ) : (
          <Link key={r.id} href={`${base}/${r.id}` as never} style={styles.revLink} testID={`revision-link-${r.revision}`}>
            {r.revision} · {r.state.replace('_', ' ')}
          </Link>
        ),
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  facts: { gap: space.xs },
  hashes: { gap: 2 },
  hash: { fontFamily: fonts.mono, fontSize: 12, color: colors.text },
  hashLabel: { color: colors.textMuted },
  revs: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'center' },
  revCurrent: { fontFamily: fonts.semibold, fontSize: 14, color: colors.text },
  revLink: { fontFamily: fonts.semibold, fontSize: 14, color: colors.primary },
});
