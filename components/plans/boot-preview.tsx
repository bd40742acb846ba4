// What runs at boot, in order, before and after the change; steps the change adds are marked "+ new".
import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import type { BootStep } from '@/hooks/use-plans';
import { Heading } from '@/components/ui/text';

const stepKey = (s: BootStep) => `${s.program.toUpperCase()} ${s.args.toUpperCase()}`;

function Steps({ title, steps, marked, testID, wide }: { title: string; steps: BootStep[]; marked: Set<string>; testID: string; wide: boolean }) {
  return (
    <View style={[styles.col, wide && styles.colWide]} testID={testID}>
      <Heading style={styles.title}>{title}</Heading>
      {steps.length === 0 ? <Text style={styles.none}>No program runs.</Text> : null}
      {steps.map((s, i) => {
        const isNew = marked.has(stepKey(s));
        return (
          <View key={i} style={[styles.step, isNew && styles.new]} accessible aria-label={`Step ${i + 1}${isNew ? ', new' : ''}: ${s.program} ${s.args}, line ${s.line}`}>
            <Text style={styles.no}>{i + 1}.</Text>
            <View style={styles.what}>
              <Text style={styles.cmd}>
                {s.program}
                {s.args ? ` ${s.args}` : ''}
              </Text>
              <Text style={styles.meta}>
                {isNew ? '+ new · ' : ''}line {s.line}
                {s.conditional ? ' · only on some boots' : ''}
              </Text>
            </View>
          </View>
        );
      })}
    </View>
  );
}

export function BootPreview({ before, after, testID = 'boot' }: { before: BootStep[]; after: BootStep[]; testID?: string }) {
  const { wide } = useBreakpoints();
  const old = new Set(before.map(stepKey));
  const added = new Set(after.map(stepKey).filter((k) => !old.has(k)));
  return (
    <View style={[styles.wrap, wide && styles.wide]} testID={testID}>
      <Steps title="At boot now" steps={before} marked={new Set()} testID={`${testID}-before`} wide={wide} />
      <Steps title="At boot after the change" steps={after} marked={added} testID={`${testID}-after`} wide={wide} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  wide: { flexDirection: 'row' },
  col: { gap: space.xs },
  colWide: { flex: 1, flexBasis: 0 },
  title: { fontSize: 15 },
  none: { fontFamily: fonts.regular, fontSize: 14, color: colors.textMuted },
  step: { flexDirection: 'row', alignItems: 'flex-start', gap: space.sm, paddingVertical: space.xs, paddingHorizontal: space.sm, borderRadius: radius.sm },
  what: { flex: 1, gap: 2 },
  new: { backgroundColor: colors.added },
  no: { fontFamily: fonts.mono, fontSize: 13, lineHeight: 19, color: colors.textMuted, width: 24 },
  cmd: { fontFamily: fonts.mono, fontSize: 13, lineHeight: 19, color: colors.text, overflowWrap: 'anywhere' } as object,
  meta: { fontFamily: fonts.regular, fontSize: 12, color: colors.textMuted },
});
