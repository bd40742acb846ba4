// Step 2, DOS: version as VER prints it (caution below the kit's minimum), boot drive, DOS folder, memory.
import { Controller, useWatch, type Control } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { space } from '@/constants/theme';
import { formatDosVersion, parseDosVersion } from '@/generators/engine/dos-version';
import type { Kit } from '@/hooks/use-kits';
import { Banner } from '@/components/ui/banner';
import { Choice } from '@/components/ui/choice';
import { TextField } from '@/components/ui/text-field';
import type { WizardForm } from './wizard-schema';

const COMMON = ['3.30', '4.01', '5.0', '6.0', '6.20', '6.22'];

export function DosStep({ control, kit, readOnly }: { control: Control<WizardForm>; kit: Kit | null; readOnly?: boolean }) {
  const dos = useWatch({ control, name: 'dos' });
  const version = parseDosVersion(dos ?? '');
  const min = kit ? parseDosVersion(kit.minDos) : null;
  return (
    <View style={styles.form}>
      <Banner tone="note" title="Read it at the PC" testID="ver-hint">
        {'Type VER at the C:\\> prompt and press Enter. DOS prints its version, for example “MS-DOS Version 6.22”. Enter the number as printed.'}
      </Banner>
      <Controller
        control={control}
        name="dos"
        render={({ field, fieldState }) => (
          <View style={{ gap: space.sm }}>
            <TextField label="DOS version" testID="profile-dos" editable={!readOnly} inputMode="decimal" value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} placeholder="6.22" />
            <Choice label="Common versions" testID="profile-dos-pick" disabled={readOnly} value={COMMON.includes(field.value) ? field.value : null} onChange={field.onChange} options={COMMON.map((v) => ({ value: v, label: v }))} />
          </View>
        )}
      />
      {version !== null && min !== null && version < min && kit ? (
        <Banner tone="caution" title="Below the kit’s minimum" testID="dos-below-min">
          {`${kit.name} needs DOS ${formatDosVersion(min)} or later; this PC runs ${formatDosVersion(version)}. The plan will be blocked until DOS is upgraded or another kit is chosen.`}
        </Banner>
      ) : null}
      <View style={styles.row}>
        <View style={styles.narrow}>
          <Controller control={control} name="bootDrive" render={({ field, fieldState }) => <TextField label="Boot drive" testID="profile-boot-drive" mono editable={!readOnly} autoCapitalize="characters" value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} />} />
        </View>
        <View style={styles.wide}>
          <Controller control={control} name="dosDir" render={({ field, fieldState }) => <TextField label="DOS folder" testID="profile-dos-dir" mono editable={!readOnly} autoCapitalize="characters" value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} hint="Where MODE.COM is, usually C:\DOS." />} />
        </View>
      </View>
      <View style={styles.row}>
        <View style={styles.half}>
          <Controller control={control} name="freeKB" render={({ field, fieldState }) => <TextField label="Free conventional memory" unit="KB" testID="profile-free-kb" inputMode="numeric" editable={!readOnly} value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} hint="If known: MEM (DOS 4.0 and later) or CHKDSK shows it." />} />
        </View>
        <View style={styles.half}>
          <Controller control={control} name="mainProgramKB" render={({ field, fieldState }) => <TextField label="Main program needs" unit="KB" testID="profile-main-kb" inputMode="numeric" editable={!readOnly} value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} hint="If known, from the program’s manual." />} />
        </View>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  narrow: { flexBasis: 100, flexGrow: 0 },
  wide: { flexBasis: 200, flexGrow: 1 },
  half: { flexBasis: 220, flexGrow: 1 },
});
