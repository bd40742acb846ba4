// How a station's progress reads on screen: a symbol and a word, never colour alone.
import { StyleSheet, Text } from 'react-native';
import { colors, fonts } from '@/constants/theme';
import type { StationRow } from '@/hooks/use-stations';

type Status = StationRow['planStatus'];

export const STATUS_LABELS: Record<Status, { mark: string; word: string; color: string }> = {
  'not-needed': { mark: '–', word: 'No plan needed', color: colors.textMuted },
  'profile-draft': { mark: '✎', word: 'Profile in progress', color: colors.warning },
  ready: { mark: '○', word: 'Profile complete', color: colors.note },
  draft: { mark: '◐', word: 'Plan draft', color: colors.note },
  in_review: { mark: '…', word: 'In review', color: colors.note },
  approved: { mark: '✓', word: 'Approved', color: colors.success },
  returned: { mark: '↩', word: 'Returned', color: colors.danger },
  released: { mark: '⇩', word: 'Released', color: colors.success },
  superseded: { mark: '×', word: 'Superseded', color: colors.textMuted },
};

export function StatusText({ status, testID }: { status: Status; testID?: string }) {
  const s = STATUS_LABELS[status];
  return (
    <Text style={[styles.text, { color: s.color }]} testID={testID}>
      {s.mark} {s.word}
    </Text>
  );
}

const FILE_WORDS = { file: '✓', none: '∅ none', missing: '? missing' } as const;
export const fileWord = (state: keyof typeof FILE_WORDS) => FILE_WORDS[state];

const styles = StyleSheet.create({ text: { fontFamily: fonts.semibold, fontSize: 14 } });
