// Import an office inventory from CSV: pick or paste the file, see every row with its errors, then write
// all rows at once (nothing is written while any row has an error).
import * as DocumentPicker from 'expo-document-picker';
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '@/constants/theme';
import { KIND_LABELS, type ImportPreviewResult } from '@/db/requests/sites';
import { ApiError } from '@/hooks/api-client';
import type { Kit } from '@/hooks/use-kits';
import { useImportMutation, useImportPreviewMutation } from '@/hooks/use-sites';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Choice } from '@/components/ui/choice';
import { TextField } from '@/components/ui/text-field';
import { Heading, Small } from '@/components/ui/text';

const EXAMPLE = 'name,number,kind,location,dos,network_port\nRECEPT,1,pc,Reception desk jack J-01,6.22,COM1\nHALLPRN,,printer,Hallway,,';

export function CsvImportPanel({ siteId, kits, onClose }: { siteId: number; kits: Kit[]; onClose: () => void }) {
  const [csv, setCsv] = useState('');
  const [kitId, setKitId] = useState<string>(kits[0] ? String(kits[0].id) : '');
  const preview = useImportPreviewMutation(siteId);
  const commit = useImportMutation(siteId);
  const [result, setResult] = useState<ImportPreviewResult | null>(null);

  async function pick() {
    const r = await DocumentPicker.getDocumentAsync({ type: ['text/csv', 'text/plain', '.csv'], copyToCacheDirectory: false });
    const asset = r.assets?.[0];
    if (r.canceled || !asset) return;
    const text = asset.file ? await asset.file.text() : await (await fetch(asset.uri)).text();
    setCsv(text);
    setResult(null);
  }
  async function check() {
    commit.reset();
    setResult(await preview.mutateAsync({ csv }).catch(() => null));
  }
  async function write() {
    await commit.mutateAsync({ csv, kitId: kitId ? Number(kitId) : null }).catch(() => undefined);
  }
  const error = (preview.error ?? commit.error) as ApiError | null;
  const done = commit.data;
  return (
    <Card testID="csv-import">
      <Heading>Import stations from CSV</Heading>
      <Small>{`Columns: name, number, kind, location, notes, dos, network_port. Only name is needed; an empty number gets the next free one of its kind. Example:`}</Small>
      <Text style={styles.example}>{EXAMPLE}</Text>
      <View style={styles.actions}>
        <Button compact variant="secondary" label="Choose a .csv file" testID="csv-pick" onPress={pick} />
      </View>
      <TextField label="CSV text" testID="csv-text" mono multiline numberOfLines={6} style={{ minHeight: 120, textAlignVertical: 'top' }} value={csv} onChangeText={(t) => { setCsv(t); setResult(null); }} autoCapitalize="none" autoCorrect={false} />
      {kits.length ? <Choice label="Kit for the imported PCs" testID="csv-kit" value={kitId || null} onChange={setKitId} options={kits.map((k) => ({ value: String(k.id), label: k.name }))} /> : null}
      {error ? <Banner tone="error">{error.message}</Banner> : null}
      {done ? <Banner tone="success" testID="csv-done">{`${done.created.length} station${done.created.length === 1 ? '' : 's'} imported.`}</Banner> : null}
      {result ? <ImportRows result={result} /> : null}
      <View style={styles.actions}>
        <Button label="Check the rows" testID="csv-check" disabled={!csv.trim()} busy={preview.isPending} onPress={check} />
        {result && result.invalid === 0 && result.fileErrors.length === 0 && !done ? <Button label={`Import ${result.valid} station${result.valid === 1 ? '' : 's'}`} testID="csv-commit" busy={commit.isPending} onPress={write} /> : null}
        <Button variant="ghost" label="Close" testID="csv-close" onPress={onClose} />
      </View>
    </Card>
  );
}

function ImportRows({ result }: { result: ImportPreviewResult }) {
  if (result.fileErrors.length) {
    return (
      <Banner tone="error" title="The file cannot be read as an inventory" testID="csv-file-errors">
        {result.fileErrors.join(' ')}
      </Banner>
    );
  }
  return (
    <View style={styles.rows} testID="csv-rows">
      <Small testID="csv-summary">{`${result.valid} row${result.valid === 1 ? '' : 's'} ready, ${result.invalid} with errors. Nothing is written until every row is ready.`}</Small>
      {result.rows.map((r) => {
        const errors = Object.entries(r.errors);
        return (
          <View key={r.line} style={[styles.row, errors.length ? styles.bad : styles.good]} testID={`csv-row-${r.line}`}>
            <Text style={styles.rowHead}>
              {errors.length ? '✕' : '✓'} {`Line ${r.line}: `}
              <Text style={styles.mono}>{r.values.name || '(no name)'}</Text>
              {` · ${r.values.number ?? '?'} · ${KIND_LABELS[r.values.kind]}${r.values.dos ? ` · DOS ${r.values.dos}` : ''}`}
            </Text>
            {errors.map(([field, message]) => (
              <Text key={field} style={styles.err}>{`${field}: ${message}`}</Text>
            ))}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  example: { fontFamily: fonts.mono, fontSize: 12, color: colors.textMuted, backgroundColor: colors.surfaceAlt, padding: space.sm, borderRadius: radius.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  rows: { gap: space.xs },
  row: { padding: space.sm, borderRadius: radius.sm, borderLeftWidth: 4, gap: 2 },
  good: { backgroundColor: colors.successSoft, borderLeftColor: colors.success },
  bad: { backgroundColor: colors.dangerSoft, borderLeftColor: colors.danger },
  rowHead: { fontFamily: fonts.semibold, fontSize: 14, color: colors.text },
  mono: { fontFamily: fonts.mono },
  err: { fontFamily: fonts.regular, fontSize: 13, color: colors.danger },
});
