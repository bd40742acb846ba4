// What runs at boot, in order, before and after the plan: the loader must appear above the final program.
import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';
import type { BootStep } from '@/generators/engine/programs';
import { Heading, Small } from '@/components/ui/text';

type Props = { before: BootStep[]; after: BootStep[]; loaderPath?: string; finalLine?: number | null; testID?: string };

export function BootPreview({ before, after, loaderPath, testID }: Props) {
  return (
    <View style={styles.cols} testID={testID}>
      <BootList title="Now" steps={before} testID={testID ? `${testID}-before` : undefined} />
      <BootList title="After the plan" steps={after} loaderPath={loaderPath} testID={testID ? `${testID}-after` : undefined} />
    </View>
  );
}

function BootList({ title, steps, loaderPath, testID }: { title: string; steps: BootStep[]; loaderPath?: string; testID?: string }) {
  const isLoader = (s: BootStep) => !!loaderPath && s.program.toUpperCase() === loaderPath.toUpperCase();
  return (
    <View style={styles.col} testID={testID}>
      <Heading style={styles.title}>{title}</Heading>
      {steps.length === 0 ? <Small>No program runs at boot.</Small> : null}
      {steps.map((s, i) => (
        <View key={`${s.line}-${i}`} style={[styles.step, isLoader(s) && styles.loader]} testID={isLoader(s) ? `${testID}-loader` : `${testID}-step`}>
          <Text style={styles.order}>{i + 1}.</Text>
          <View style={styles.body}>
            <Text style={styles.code}>
              {s.program}
              {s.args ? ` ${s.args}` : ''}
            </Text>
            <Text style={styles.meta}>
              line {s.line}
              {s.conditional ? ' · only when its IF holds' : ''}
              {isLoader(s) ? ' · ◆ network loader' : ''}
            </Text>
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  cols: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  col: { flexGrow: 1, flexBasis: 260, gap: space.xs },
  title: { fontSize: 15 },
  step: { flexDirection: 'row', alignItems: 'flex-start', gap: space.sm, paddingVertical: 2, paddingHorizontal: space.xs, borderRadius: radius.sm },
  loader: { backgroundColor: colors.primarySoft, borderLeftWidth: 3, borderLeftColor: colors.primary },
  order: { fontFamily: fonts.mono, fontSize: 13, lineHeight: 19, color: colors.textMuted, width: 22 },
  body: { flex: 1, minWidth: 0 },
  code: { fontFamily: fonts.mono, fontSize: 13, lineHeight: 19, color: colors.text },
  meta: { fontFamily: fonts.regular, fontSize: 12, color: colors.textMuted },
});
