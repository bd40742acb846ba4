// The station directory: a sortable table on a wide screen, one card per station on a phone.
import { Link } from 'expo-router';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';
import { KIND_LABELS } from '@/db/requests/sites';
import type { StationSort } from '@/db/requests/stations';
import type { StationRow } from '@/hooks/use-stations';
import { Small } from '@/components/ui/text';
import { fileWord, StatusText } from '@/components/stations/status';

export type SortState = { sort: StationSort; dir: 'asc' | 'desc' };

const COLUMNS: Array<{ key: StationSort; label: string; flex: number }> = [
  { key: 'number', label: 'No.', flex: 0.6 },
  { key: 'name', label: 'Name', flex: 1.2 },
  { key: 'kind', label: 'Kind', flex: 0.8 },
  { key: 'dos', label: 'DOS', flex: 0.6 },
  { key: 'networkPort', label: 'Network port', flex: 0.9 },
  { key: 'status', label: 'Plan status', flex: 1.5 },
];

export function StationTable({ rows, sort, onSort }: { rows: StationRow[]; sort: SortState; onSort: (s: SortState) => void }) {
  return (
    <View style={styles.table} role="table" aria-label="Station directory" testID="station-table">
      <View style={[styles.tr, styles.thead]} role="row">
        {COLUMNS.map((c) => {
          const on = sort.sort === c.key;
          return (
            <Pressable
              key={c.key}
              role="columnheader"
              aria-sort={on ? (sort.dir === 'asc' ? 'ascending' : 'descending') : 'none'}
              testID={`sort-${c.key}`}
              onPress={() => onSort({ sort: c.key, dir: on && sort.dir === 'asc' ? 'desc' : 'asc' })}
              style={[styles.th, { flex: c.flex }]}
            >
              <Text style={[styles.thText, on && styles.thOn]}>
                {c.label}
                {on ? (sort.dir === 'asc' ? ' ▲' : ' ▼') : ' ↕'}
              </Text>
            </Pressable>
          );
        })}
        <View style={[styles.th, { flex: 1.1 }]} role="columnheader">
          <Text style={styles.thText}>Files</Text>
        </View>
        <View style={[styles.th, { flex: 1.6 }]} role="columnheader">
          <Text style={styles.thText}>Location</Text>
        </View>
      </View>
      {rows.map((r) => (
        <Link key={r.id} href={(r.kind === 'pc' ? `/stations/${r.id}/wizard` : `/stations/${r.id}`) as never} asChild>
          <Pressable role="row" accessibilityRole="link" testID={`station-row-${r.name}`} style={ROW_STYLE}>
            <Text style={[styles.td, styles.mono, { flex: 0.6 }]}>{r.number}</Text>
            <Text style={[styles.td, styles.mono, styles.name, { flex: 1.2 }]}>{r.name}</Text>
            <Text style={[styles.td, { flex: 0.8 }]}>{KIND_LABELS[r.kind]}</Text>
            <Text style={[styles.td, styles.mono, { flex: 0.6 }]}>{r.dos ?? '—'}</Text>
            <Text style={[styles.td, styles.mono, { flex: 0.9 }]}>{r.networkPort ?? '—'}</Text>
            <View style={[styles.tdBox, { flex: 1.5 }]}>
              <StatusText status={r.planStatus} testID={`station-status-${r.name}`} />
            </View>
            <View style={[styles.tdBox, { flex: 1.1 }]}>
              {r.kind === 'pc' ? <Small>{`AUTOEXEC ${fileWord(r.files.autoexec)}\nCONFIG ${fileWord(r.files.config)}`}</Small> : <Small>—</Small>}
            </View>
            <Text style={[styles.td, { flex: 1.6 }]} numberOfLines={2}>
              {r.location || '—'}
            </Text>
          </Pressable>
        </Link>
      ))}
    </View>
  );
}

export function StationCards({ rows }: { rows: StationRow[] }) {
  return (
    <View style={styles.cards} testID="station-cards">
      {rows.map((r) => (
        <Link key={r.id} href={(r.kind === 'pc' ? `/stations/${r.id}/wizard` : `/stations/${r.id}`) as never} asChild>
          <Pressable accessibilityRole="link" testID={`station-card-${r.name}`} style={CARD_STYLE}>
            <View style={styles.cardHead}>
              <Text style={[styles.mono, styles.cardName]}>{r.name}</Text>
              <Text style={styles.cardNo}>{`No. ${r.number} · ${KIND_LABELS[r.kind]}`}</Text>
            </View>
            {r.kind === 'pc' ? <Text style={styles.td}>{`DOS ${r.dos ?? '—'} · network ${r.networkPort ?? '—'}`}</Text> : null}
            <StatusText status={r.planStatus} />
            {r.location ? <Small>{r.location}</Small> : null}
          </Pressable>
        </Link>
      ))}
    </View>
  );
}

// Link's asChild slot hands the style straight to the DOM on web: one flat object, no function.
const styles = StyleSheet.create({
  table: { borderWidth: 1, borderColor: colors.border, borderRadius: radius.lg, backgroundColor: colors.surface, overflow: 'hidden' },
  tr: { flexDirection: 'row', alignItems: 'center', paddingHorizontal: space.md, gap: space.sm },
  thead: { backgroundColor: colors.surfaceAlt, borderBottomWidth: 1, borderBottomColor: colors.border },
  th: { paddingVertical: space.sm },
  thText: { fontFamily: fonts.semibold, fontSize: 13, color: colors.text },
  thOn: { color: colors.primary },
  row: { minHeight: 52, borderBottomWidth: 1, borderBottomColor: colors.border },
  hover: { backgroundColor: colors.primarySoft },
  td: { fontFamily: fonts.regular, fontSize: 14, color: colors.text },
  tdBox: { paddingVertical: space.xs },
  mono: { fontFamily: fonts.mono, fontSize: 14 },
  name: { fontFamily: fonts.mono, color: colors.primary },
  cards: { gap: space.md },
  card: { backgroundColor: colors.surface, borderColor: colors.border, borderWidth: 1, borderRadius: radius.lg, padding: space.md, gap: space.xs },
  cardHead: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'baseline', gap: space.sm },
  cardName: { fontSize: 17, color: colors.primary },
  cardNo: { fontFamily: fonts.semibold, fontSize: 13, color: colors.textMuted },
});

const ROW_STYLE = StyleSheet.flatten([styles.tr, styles.row]);
const CARD_STYLE = StyleSheet.flatten(styles.card);
