import { StyleSheet, View } from 'react-native';
import { colors, space } from '@/constants/theme';
import { ROLE_LABELS } from '@/constants/navigation';
import { ApiError } from '@/hooks/api-client';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useInviteMutation, usePeopleQuery, useSetActiveMutation, useSetRoleMutation, type Person } from '@/hooks/use-people';
import { useSessionQuery, type Role } from '@/hooks/use-session';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Choice } from '@/components/ui/choice';
import { Screen } from '@/components/ui/screen';
import { Body, Heading, Small } from '@/components/ui/text';
import { InviteForm } from './invite-form';

const ROLE_OPTIONS = (['admin', 'lead', 'technician', 'user'] as const).map((r) => ({ value: r, label: ROLE_LABELS[r] }));

export function PeopleScreen() {
  const people = usePeopleQuery();
  const invite = useInviteMutation();
  const { wide } = useBreakpoints();
  const inviteError = invite.error instanceof ApiError ? invite.error : null;
  return (
    <Screen title="People" subtitle="Everyone with an account at your company, and their role.">
      <View style={[styles.cols, wide && styles.colsWide]}>
        <View style={styles.list}>
          {people.isError ? <Banner tone="error">{(people.error as Error).message}</Banner> : null}
          {people.data?.items.map((p) => <PersonRow key={p.id} person={p} />)}
        </View>
        <Card style={wide ? styles.side : undefined}>
          <Heading>Invite someone</Heading>
          <Small>They get an e-mail with a link that sets their password. It works once and expires in 72 hours.</Small>
          {invite.isSuccess ? <Banner tone="success" testID="invite-sent">Invitation sent.</Banner> : null}
          {inviteError ? <Banner tone="error">{inviteError.message}</Banner> : null}
          <InviteForm busy={invite.isPending} serverFields={inviteError?.fields} onSubmit={(v) => invite.mutateAsync(v).catch(() => undefined)} />
        </Card>
      </View>
    </Screen>
  );
}

function PersonRow({ person }: { person: Person }) {
  const me = useSessionQuery().data;
  const setRole = useSetRoleMutation();
  const setActive = useSetActiveMutation();
  const self = me?.id === person.id;
  const error = (setRole.error ?? setActive.error) as Error | null;
  return (
    <Card testID={`person-${person.email}`}>
      <View style={styles.personHead}>
        <View style={{ flexShrink: 1 }}>
          <Heading>{person.name}</Heading>
          <Small>{person.email}</Small>
        </View>
        <Body style={person.banned ? styles.off : styles.on}>{person.banned ? '⊘ Deactivated' : person.invitationPending ? '… Invited' : '● Active'}</Body>
      </View>
      {error ? <Banner tone="error">{error.message}</Banner> : null}
      <Choice<Role> label="Role" testID={`role-${person.email}`} options={ROLE_OPTIONS} value={person.role} disabled={self || setRole.isPending} onChange={(role) => setRole.mutate({ id: person.id, role })} />
      {self ? (
        <Small>This is you: another admin can change your role.</Small>
      ) : (
        <View style={{ flexDirection: 'row' }}>
          <Button
            compact
            variant="secondary"
            testID={`toggle-active-${person.email}`}
            label={person.banned ? 'Reactivate' : 'Deactivate'}
            busy={setActive.isPending}
            onPress={() => setActive.mutate({ id: person.id, active: !!person.banned })}
          />
        </View>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  cols: { gap: space.lg },
  colsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  list: { flex: 1, gap: space.md },
  side: { width: 360 },
  personHead: { flexDirection: 'row', justifyContent: 'space-between', gap: space.md, flexWrap: 'wrap' },
  on: { color: colors.success },
  off: { color: colors.danger },
});
