import { StyleSheet, Text, View } from 'react-native';
import { readingIdOf, type SurveyJackRow, type SurveyReadingRow, type SurveyView } from '@/db/requests/survey';
import { colors, fonts, radius, space } from '@/constants/theme';
import type { JackResult, PairResult, SurveyCheck } from '@/generators/survey/types';
import { Card } from '@/components/ui/card';
import { Small } from '@/components/ui/text';
import { PAIR_STATUS, SEVERITY, volts } from './format';
import { LinkButton } from './link-button';

type JackLine = { jack: SurveyJackRow; result: JackResult | undefined; pairs: Array<PairResult & { reading?: SurveyReadingRow }>; flags: SurveyCheck[] };

function jackLines(view: SurveyView): JackLine[] {
  const readings = new Map(view.readings.map((r) => [r.id, r]));
  return view.jacks.map((jack) => {
    const result = view.result.jacks.find((j) => j.jackId === jack.ref);
    const pairs = (result?.pairs ?? []).filter((p) => p.current).map((p) => ({ ...p, reading: readings.get(readingIdOf(p.testId)) }));
    const flags = view.result.checks.filter((c) => c.severity !== 'note' && c.jackIds.includes(jack.ref));
    return { jack, result, pairs, flags };
  });
}

/** Jacks and their current readings: a table on a wide screen, one card per jack on a phone. */
export function JacksView({ view, wide }: { view: SurveyView; wide: boolean }) {
  const lines = jackLines(view);
  if (lines.length === 0) return <Small>No jacks recorded yet.</Small>;
  return wide ? <JacksTable view={view} lines={lines} /> : <View style={styles.cards}>{lines.map((l) => <JackCard key={l.jack.id} siteId={view.site.id} line={l} />)}</View>;
}

function PairLine({ p }: { p: JackLine['pairs'][number] }) {
  const s = PAIR_STATUS[p.status];
  return (
    <View>
      <Text style={styles.pair}>
        <Text style={styles.pairName}>{p.pair} </Text>
        <Text style={[styles.status, { color: s.fg }]}>
          {s.mark} {s.word}
        </Text>
      </Text>
      <Text style={styles.small}>{`${volts(p.reading?.vdc ?? null, 'V DC')} · ${volts(p.reading?.vac ?? null, 'V AC')} · continuity ${p.continuity ?? '–'}`}</Text>
    </View>
  );
}

function NetworkStatus({ result }: { result: JackResult | undefined }) {
  const status = result?.networkPairStatus;
  if (status === null || status === undefined) return <Text style={styles.muted}>No network pair chosen</Text>;
  const s = PAIR_STATUS[status];
  return (
    <Text style={[styles.status, { color: s.fg }]}>
      {s.mark} {s.word}
    </Text>
  );
}

function Flags({ flags }: { flags: SurveyCheck[] }) {
  if (flags.length === 0) return null;
  return (
    <View style={styles.flags}>
      {flags.map((c, i) => (
        <Text key={i} style={[styles.flag, { color: SEVERITY[c.severity].fg }]}>
          {SEVERITY[c.severity].mark} {c.slug}
        </Text>
      ))}
    </View>
  );
}

function JackCard({ siteId, line }: { siteId: number; line: JackLine }) {
  const { jack, pairs, flags, result } = line;
  return (
    <Card testID={`jack-card-${jack.ref}`} style={flags.length ? styles.flaggedCard : undefined}>
      <View style={styles.cardHead}>
        <Text style={styles.jackLabel}>{jack.label}</Text>
        <Text style={styles.ref}>{jack.ref}</Text>
      </View>
      <Small>{[jack.room, jack.station && `station ${jack.station}`].filter(Boolean).join(' · ') || 'No room or station recorded'}</Small>
      <View style={styles.pairs}>{pairs.length ? pairs.map((p) => <PairLine key={p.testId} p={p} />) : <Text style={styles.muted}>– No readings yet</Text>}</View>
      <Text style={styles.small}>
        Network pair: <NetworkStatus result={result} />
      </Text>
      <Flags flags={flags} />
      <View style={styles.row}>
        <LinkButton href={`/survey/${siteId}/jacks/${jack.id}`} label="Readings at this jack" testID={`open-jack-${jack.ref}`} />
      </View>
    </Card>
  );
}

const COLS = { jack: 230, pair: 170, vdc: 80, vac: 80, continuity: 100, status: 120, action: 110 };

function Th({ text, width, right }: { text: string; width?: number; right?: boolean }) {
  return (
    <Text style={[styles.thText, width ? { width } : styles.grow, right && styles.right]} role="columnheader">
      {text}
    </Text>
  );
}

/** One row per current pair reading; the jack's own cells span its pairs. */
function JacksTable({ view, lines }: { view: SurveyView; lines: JackLine[] }) {
  const network = view.settings.networkPair.split(' ')[0];
  return (
    <View style={styles.table} testID="jacks-table" role="table">
      <View style={[styles.tr, styles.th]} role="row">
        <Th text="Jack, room, station" width={COLS.jack} />
        <Th text="Pair" width={COLS.pair} />
        <Th text="V DC" width={COLS.vdc} right />
        <Th text="V AC" width={COLS.vac} right />
        <Th text="Continuity" width={COLS.continuity} />
        <Th text="Status" />
        <View style={{ width: COLS.action }} />
      </View>
      {lines.map((l) => (
        <View key={l.jack.id} style={[styles.tr, l.flags.length > 0 && styles.flaggedRow]} role="row" testID={`jack-row-${l.jack.ref}`}>
          <View style={{ width: COLS.jack, gap: 2 }} role="rowheader">
            <Text style={styles.jackLabel}>{l.jack.label}</Text>
            <Text style={styles.small}>{[l.jack.room, l.jack.station].filter(Boolean).join(' · ') || '–'}</Text>
            <Text style={styles.ref}>{l.jack.ref}</Text>
            <Flags flags={l.flags} />
          </View>
          <View style={[styles.grow, styles.pairs]}>
            {l.pairs.length === 0 ? <Text style={styles.muted}>– No readings yet</Text> : null}
            {l.pairs.map((p) => {
              const s = PAIR_STATUS[p.status];
              return (
                <View key={p.testId} style={styles.pairRow}>
                  <Text style={[styles.td, styles.pairName, { width: COLS.pair }]} role="cell">
                    {p.pair}
                    {p.pair.split(' ')[0] === network ? ' ★' : ''}
                  </Text>
                  <Text style={[styles.td, styles.num, { width: COLS.vdc }]} role="cell">{p.reading?.vdc ?? '–'}</Text>
                  <Text style={[styles.td, styles.num, { width: COLS.vac }]} role="cell">{p.reading?.vac ?? '–'}</Text>
                  <Text style={[styles.td, { width: COLS.continuity }]} role="cell">{p.continuity ?? '–'}</Text>
                  <Text style={[styles.status, styles.grow, { color: s.fg }]} role="cell">
                    {s.mark} {s.word}
                  </Text>
                </View>
              );
            })}
          </View>
          <View style={{ width: COLS.action, alignItems: 'flex-end' }} role="cell">
            <LinkButton href={`/survey/${view.site.id}/jacks/${l.jack.id}`} label="Readings" testID={`open-jack-${l.jack.ref}`} />
          </View>
        </View>
      ))}
      <Text style={[styles.small, styles.foot]}>Volts as entered. ★ the network pair. Only each pair’s latest reading is shown.</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  cards: { gap: space.md },
  cardHead: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'baseline', gap: space.sm },
  flaggedCard: { borderColor: colors.danger, borderWidth: 2, borderStyle: 'dashed' },
  jackLabel: { fontFamily: fonts.semibold, fontSize: 15, color: colors.text },
  ref: { fontFamily: fonts.mono, fontSize: 12, color: colors.textMuted },
  pairs: { gap: 4 },
  pair: { fontFamily: fonts.regular, fontSize: 14, lineHeight: 20, color: colors.text },
  pairName: { fontFamily: fonts.semibold },
  status: { fontFamily: fonts.semibold, fontSize: 14 },
  muted: { fontFamily: fonts.regular, fontSize: 14, color: colors.textMuted },
  small: { fontFamily: fonts.regular, fontSize: 14, color: colors.text },
  flags: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  flag: { fontFamily: fonts.semibold, fontSize: 13 },
  row: { flexDirection: 'row' },
  table: { borderWidth: 1, borderColor: colors.border, borderRadius: radius.md, backgroundColor: colors.surface, overflow: 'hidden' },
  tr: { flexDirection: 'row', alignItems: 'flex-start', gap: space.md, paddingHorizontal: space.md, paddingVertical: space.sm, borderTopWidth: 1, borderTopColor: colors.border },
  th: { backgroundColor: colors.surfaceAlt, borderTopWidth: 0 },
  thText: { fontFamily: fonts.semibold, fontSize: 13, color: colors.text },
  td: { fontFamily: fonts.regular, fontSize: 14, color: colors.text },
  grow: { flex: 1 },
  right: { textAlign: 'right' },
  num: { textAlign: 'right', fontFamily: fonts.mono, fontSize: 13 },
  pairRow: { flexDirection: 'row', gap: space.md, alignItems: 'baseline' },
  foot: { padding: space.md, color: colors.textMuted },
  flaggedRow: { backgroundColor: colors.dangerSoft },
});
