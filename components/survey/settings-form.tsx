import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import type { z } from 'zod';
import { settingsUpdateSchema, type SurveyNodeRow, type SurveySettingsRow } from '@/db/requests/survey';
import { space } from '@/constants/theme';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { NodePicker } from './node-picker';
import { serverProblem } from './questions';

export type SettingsFormValues = z.output<typeof settingsUpdateSchema>;

/** The chosen centre of the star and the pair that carries the network. */
export function SettingsForm({ settings, nodes, onSubmit }: { settings: SurveySettingsRow; nodes: SurveyNodeRow[]; onSubmit: (v: SettingsFormValues) => Promise<unknown> }) {
  const { control, handleSubmit, setError } = useForm<z.input<typeof settingsUpdateSchema>, unknown, SettingsFormValues>({
    resolver: zodResolver(settingsUpdateSchema),
    values: { centreNodeId: settings.centreNodeId, networkPair: settings.networkPair, version: settings.version },
    mode: 'onTouched',
  });
  const [problem, setProblem] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const submit = handleSubmit(async (v) => {
    setProblem(null);
    setSaved(false);
    try {
      await onSubmit(v);
      setSaved(true);
    } catch (err) {
      setProblem(serverProblem(err, setError));
    }
  });
  return (
    <View style={styles.form} testID="settings-form">
      <Controller
        control={control}
        name="centreNodeId"
        render={({ field }) => <NodePicker allowNone label="Centre of the star" testID="settings-centre" nodes={nodes} value={field.value} onChange={field.onChange} />}
      />
      <Controller
        control={control}
        name="networkPair"
        render={({ field, fieldState }) => (
          <TextField label="Network pair" hint="The spare pair that carries the network, e.g. 2 (black/yellow)" testID="settings-pair" value={field.value ?? ''} onChangeText={field.onChange} onBlur={field.onBlur} error={fieldState.error?.message} />
        )}
      />
      {problem ? <Banner tone="error">{problem}</Banner> : null}
      {saved ? <Banner tone="success">Saved.</Banner> : null}
      <Button label="Save settings" testID="settings-submit" onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.md } });
