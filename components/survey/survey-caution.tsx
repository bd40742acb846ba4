import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, maxContentWidth, space } from '@/constants/theme';
import { SURVEY_CAUTIONS } from '@/generators/survey/cautions';

/**
 * The caution every survey screen keeps in view, pinned above the scrolling page. The short line names
 * the voltages of REFERENCES §6.5 (about 48 V DC, [MACASSEY] [TIPRING]) and §6.7 (ringing near 90 V AC,
 * [TIPRING]); "All cautions" opens the full list the report prints (generators/survey/cautions.ts).
 */
export function SurveyCaution() {
  const [open, setOpen] = useState(false);
  return (
    <View style={styles.bar} testID="survey-caution" accessibilityRole="alert" aria-live="polite">
      <View style={styles.inner}>
        <Text style={styles.mark} aria-hidden>
          ⚠
        </Text>
        <View style={styles.body}>
          <Text style={styles.text}>
            <Text style={styles.word}>Caution: </Text>
            telephone pairs can carry about 48 V DC, and ringing near 90 V AC. Test every pair before touching it. Follow
            local codes (NEC Article 800 in the US) and licensed practice.
          </Text>
          {open ? (
            <View style={styles.list} testID="survey-caution-all">
              {SURVEY_CAUTIONS.map((c) => (
                <Text key={c} style={styles.item}>
                  • {c}
                </Text>
              ))}
            </View>
          ) : null}
        </View>
        <Pressable onPress={() => setOpen(!open)} accessibilityRole="button" aria-expanded={open} testID="survey-caution-toggle" style={styles.toggle}>
          <Text style={styles.toggleText}>{open ? 'Less' : 'All cautions'}</Text>
        </Pressable>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { backgroundColor: colors.warningSoft, borderBottomWidth: 2, borderBottomColor: colors.warning, paddingHorizontal: space.lg, paddingVertical: space.sm },
  inner: { flexDirection: 'row', gap: space.sm, alignItems: 'flex-start', width: '100%', maxWidth: maxContentWidth, alignSelf: 'center' },
  mark: { fontFamily: fonts.bold, fontSize: 16, color: colors.warning, lineHeight: 20 },
  body: { flex: 1, gap: space.xs },
  word: { fontFamily: fonts.semibold, color: colors.warning },
  text: { fontFamily: fonts.regular, fontSize: 13, lineHeight: 18, color: colors.text },
  list: { gap: 2, paddingTop: space.xs },
  item: { fontFamily: fonts.regular, fontSize: 13, lineHeight: 18, color: colors.text },
  toggle: { paddingHorizontal: space.sm, minHeight: 32, justifyContent: 'center' },
  toggleText: { fontFamily: fonts.semibold, fontSize: 13, color: colors.primary, textDecorationLine: 'underline' },
});
