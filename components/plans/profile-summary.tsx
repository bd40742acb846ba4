// The station's profile as the plan was made from it: DOS, ports and what is on them, network settings,
// printer redirection, the resident program line, memory.
import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, space } from '@/constants/theme';
import type { ProfileSummarySource } from '@/hooks/use-plans';

const ATTACHED: Record<string, string> = { adapter: 'network adapter', mouse: 'mouse', modem: 'modem', printer: 'local printer', other: 'something else', none: 'nothing' };

function Row({ label, value }: { label: string; value: string }) {
  return (
    <View style={styles.row}>
      <Text style={styles.label}>{label}</Text>
      <Text style={styles.value}>{value}</Text>
    </View>
  );
}

export function ProfileSummary({ profile, kit, error }: { profile: ProfileSummarySource; kit: string | null; error?: string | null }) {
  const n = profile.network;
  return (
    <View style={styles.box} testID="profile-summary">
      {error ? <Text style={styles.error}>✕ Profile not valid: {error}</Text> : null}
      <Row label="DOS" value={`${profile.dos ?? '?'} on drive ${profile.bootDrive ?? '?'}, DOS folder ${profile.dosDir ?? '?'}`} />
      <Row label="Ports" value={(profile.ports ?? []).map((p) => `${p.name}: ${p.present ? ATTACHED[p.attached] ?? p.attached : 'not present'}`).join(' · ') || 'none recorded'} />
      {n ? <Row label="Network" value={`${n.port}, ${n.baud} baud, parity ${n.parity}, ${n.dataBits} data bits, ${n.stopBits} stop bit${n.stopBits === 1 ? '' : 's'}`} /> : null}
      <Row label="Printing" value={profile.redirect ? `${profile.redirect.from} sent to ${profile.redirect.to}` : 'not redirected'} />
      {profile.loader ? <Row label="Resident program" value={`${profile.loader.path} ${profile.loader.args}`.trim()} /> : null}
      <Row label="Kit" value={kit ?? 'none'} />
      {profile.memory?.freeKB ? <Row label="Memory" value={`${profile.memory.freeKB} KB free${profile.memory.mainProgramKB ? `, main program needs ${profile.memory.mainProgramKB} KB` : ''}`} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  label: { fontFamily: fonts.semibold, fontSize: 14, color: colors.text, width: 140 },
  value: { fontFamily: fonts.regular, fontSize: 14, color: colors.text, flex: 1, minWidth: 180 },
  error: { fontFamily: fonts.semibold, fontSize: 14, color: colors.danger },
});
