import { useState } from 'react';
import { Pressable, StyleSheet, Text, TextInput, View } from 'react-native';
import { NODE_KIND_LABELS, type SurveyNodeRow } from '@/db/requests/survey';
import { colors, fonts, radius, space } from '@/constants/theme';

const SHOWN = 8;

/** Chooses one point of the network: type part of its label or short name, then press it. */
export function NodePicker({ label, nodes, value, onChange, error, testID, allowNone }: {
  label: string;
  nodes: SurveyNodeRow[];
  value: number | null | undefined;
  onChange: (id: number | null) => void;
  error?: string;
  testID: string;
  allowNone?: boolean;
}) {
  const [filter, setFilter] = useState('');
  const [open, setOpen] = useState(value == null);
  const chosen = nodes.find((n) => n.id === value);
  const choose = (id: number | null) => {
    onChange(id);
    setOpen(false);
    setFilter('');
  };
  const needle = filter.trim().toLowerCase();
  const matches = nodes.filter((n) => n.id !== value && (!needle || `${n.ref} ${n.label}`.toLowerCase().includes(needle)));
  return (
    <View style={styles.wrap}>
      <Text style={styles.label} nativeID={`${testID}-label`}>
        {label}
      </Text>
      <View style={styles.chosenRow}>
        <Text style={styles.chosen} testID={`${testID}-value`}>
          {chosen ? `✓ ${chosen.ref} · ${chosen.label} (${NODE_KIND_LABELS[chosen.kind]})` : '– none chosen'}
        </Text>
        {open ? null : <Option text="Change" onPress={() => setOpen(true)} testID={`${testID}-change`} />}
      </View>
      {open ? (
        <>
          <TextInput
            style={styles.filter}
            value={filter}
            onChangeText={setFilter}
            placeholder="Type to find a point"
            placeholderTextColor={colors.textMuted}
            accessibilityLabel={`Find: ${label}`}
            testID={`${testID}-filter`}
          />
          <View style={styles.options} role="group" aria-labelledby={`${testID}-label`}>
            {allowNone && value != null ? <Option text="– none" onPress={() => choose(null)} testID={`${testID}-none`} /> : null}
            {matches.slice(0, SHOWN).map((n) => (
              <Option key={n.id} text={`${n.ref} · ${n.label}`} onPress={() => choose(n.id)} testID={`${testID}-option-${n.ref}`} />
            ))}
            {matches.length > SHOWN ? <Text style={styles.more}>{matches.length - SHOWN} more: type to narrow down.</Text> : null}
          </View>
        </>
      ) : null}
      {error ? (
        <Text style={styles.error} accessibilityRole="alert" testID={`${testID}-error`}>
          {error}
        </Text>
      ) : null}
    </View>
  );
}

function Option({ text, onPress, testID }: { text: string; onPress: () => void; testID: string }) {
  return (
    <Pressable accessibilityRole="button" onPress={onPress} testID={testID} style={(s) => [styles.option, (s as { focused?: boolean }).focused && styles.focus]}>
      <Text style={styles.optionText} numberOfLines={1}>
        {text}
      </Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  label: { fontFamily: fonts.semibold, fontSize: 14, color: colors.text },
  chosenRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  chosen: { fontFamily: fonts.regular, fontSize: 14, color: colors.text, flexShrink: 1 },
  filter: {
    minHeight: 40, borderWidth: 1, borderColor: colors.borderStrong, borderRadius: radius.md, backgroundColor: colors.surface,
    paddingHorizontal: space.md, fontFamily: fonts.regular, fontSize: 14, color: colors.text,
  },
  options: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  option: { minHeight: 36, justifyContent: 'center', paddingHorizontal: space.sm, borderRadius: radius.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surfaceAlt, maxWidth: 260 },
  optionText: { fontFamily: fonts.regular, fontSize: 13, color: colors.text },
  more: { fontFamily: fonts.regular, fontSize: 13, color: colors.textMuted, alignSelf: 'center' },
  error: { fontFamily: fonts.regular, fontSize: 13, color: colors.danger },
  focus: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid' } as object,
});
