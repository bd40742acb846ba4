import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';

export type SurveyTab = 'checks' | 'jacks' | 'wiring';
export const SURVEY_TABS: Array<{ value: SurveyTab; label: string; short: string }> = [
  { value: 'checks', label: 'Checks and drawing', short: 'Checks' },
  { value: 'jacks', label: 'Jacks and readings', short: 'Jacks' },
  { value: 'wiring', label: 'Wiring', short: 'Wiring' },
];

/** The survey's three views; the chosen one is marked by a bar and bold text, not colour alone. */
export function SurveyTabs({ value, onChange, short }: { value: SurveyTab; onChange: (t: SurveyTab) => void; short?: boolean }) {
  return (
    <View style={styles.row} role="tablist" aria-label="Survey views">
      {SURVEY_TABS.map((t) => {
        const on = t.value === value;
        return (
          <Pressable
            key={t.value}
            role="tab"
            aria-selected={on}
            testID={`survey-tab-${t.value}`}
            onPress={() => onChange(t.value)}
            style={(s) => [styles.tab, on && styles.on, (s as { focused?: boolean }).focused && styles.focus]}
          >
            <Text style={[styles.text, on && styles.textOn]}>{short ? t.short : t.label}</Text>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs, borderBottomWidth: 1, borderBottomColor: colors.border },
  tab: { minHeight: 44, justifyContent: 'center', paddingHorizontal: space.md, borderTopLeftRadius: radius.md, borderTopRightRadius: radius.md, borderBottomWidth: 3, borderBottomColor: 'transparent' },
  on: { borderBottomColor: colors.primary, backgroundColor: colors.primarySoft },
  focus: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid' } as object,
  text: { fontFamily: fonts.regular, fontSize: 14, color: colors.text },
  textOn: { fontFamily: fonts.bold, color: colors.primary },
});
