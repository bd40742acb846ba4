// Step 5, startup files: for AUTOEXEC.BAT and CONFIG.SYS, upload the file, paste its text, or record that
// this machine has none. Every choice is a new revision; older ones stay.
import * as DocumentPicker from 'expo-document-picker';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '@/constants/theme';
import type { FileKind } from '@/db/requests/stations';
import { ApiError } from '@/hooks/api-client';
import { useFileTextQuery, useRecordFileMutation, type FileInputChoice, type FileRevision } from '@/hooks/use-stations';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Heading, Small } from '@/components/ui/text';
import { FileLines } from '@/components/stations/file-lines';
import { PasteForm } from './paste-form';

type Props = { stationId: number; files: { autoexec: FileRevision | null; config: FileRevision | null }; readOnly?: boolean; onRecorded: (kind: FileKind) => void };

export function FilesStep({ stationId, files, readOnly, onRecorded }: Props) {
  return (
    <View style={styles.list}>
      <Small>Copy the files from the PC’s boot drive (a diskette, or the user reads them out), or paste their text. If the PC has no such file, say so: the plan then writes a new one.</Small>
      <FileCard stationId={stationId} kind="AUTOEXEC.BAT" current={files.autoexec} readOnly={readOnly} onRecorded={onRecorded} />
      <FileCard stationId={stationId} kind="CONFIG.SYS" current={files.config} readOnly={readOnly} onRecorded={onRecorded} />
    </View>
  );
}

function describe(f: FileRevision): string {
  const when = new Date(f.uploadedAt).toLocaleString();
  if (f.absent) return `This machine has none (recorded ${when}).`;
  const how = { upload: 'uploaded', paste: 'pasted', user: 'sent by the office user', seed: 'from the demo data', none: '' }[f.source];
  return `${f.size} bytes, ${how} ${when}. SHA-256 ${f.sha256.slice(0, 12)}…`;
}

async function pickFile(): Promise<{ file: Blob; name: string } | null> {
  const result = await DocumentPicker.getDocumentAsync({ type: '*/*', copyToCacheDirectory: false, multiple: false });
  if (result.canceled || !result.assets?.[0]) return null;
  const asset = result.assets[0];
  // On the web the picker hands over the File itself; elsewhere read it from its URI.
  const file = asset.file ?? (await (await fetch(asset.uri)).blob());
  return { file, name: asset.name };
}

function FileCard({ stationId, kind, current, readOnly, onRecorded }: { stationId: number; kind: FileKind; current: FileRevision | null; readOnly?: boolean; onRecorded: (kind: FileKind) => void }) {
  const record = useRecordFileMutation(stationId);
  const [pasting, setPasting] = useState(false);
  const [showText, setShowText] = useState(false);
  const text = useFileTextQuery(stationId, showText && current && !current.absent ? current.id : null);
  const id = kind === 'AUTOEXEC.BAT' ? 'autoexec' : 'config';
  const error = record.error instanceof ApiError ? record.error : null;

  async function save(choice: FileInputChoice) {
    record.reset();
    try {
      await record.mutateAsync(choice);
      setPasting(false);
      onRecorded(kind);
    } catch {
      // Shown from record.error.
    }
  }

  async function upload() {
    const picked = await pickFile();
    if (picked) await save({ kind, mode: 'upload', ...picked });
  }

  return (
    <Card testID={`file-${id}`}>
      <Heading>{kind}</Heading>
      <Small testID={`file-${id}-state`}>{current ? `${current.absent ? '∅' : '✓'} ${describe(current)}` : '? Not recorded yet.'}</Small>
      {error && !pasting ? (
        <Banner tone="error" title="Not saved" testID={`file-${id}-error`}>
          {error.message}
        </Banner>
      ) : null}
      {record.isSuccess && !error ? <Banner tone="success" testID={`file-${id}-saved`}>{`${kind} recorded as a new revision.`}</Banner> : null}
      {readOnly ? null : pasting ? (
        <PasteForm kind={kind} busy={record.isPending} serverError={error?.fields.text ?? error?.message} onCancel={() => setPasting(false)} onSubmit={(t) => save({ kind, mode: 'paste', text: t })} />
      ) : (
        <View style={styles.actions}>
          <Button compact label="Upload file" testID={`file-${id}-upload`} busy={record.isPending} onPress={upload} />
          <Button compact variant="secondary" label="Paste text" testID={`file-${id}-paste`} onPress={() => setPasting(true)} />
          <Button compact variant="secondary" label="This machine has none" testID={`file-${id}-none`} onPress={() => save({ kind, mode: 'none' })} />
        </View>
      )}
      {current && !current.absent ? (
        <View style={{ gap: space.sm }}>
          <View style={{ flexDirection: 'row' }}>
            <Button compact variant="ghost" label={showText ? 'Hide the text' : 'Show the text'} testID={`file-${id}-show`} onPress={() => setShowText((s) => !s)} />
          </View>
          {showText && text.data?.text != null ? <FileLines text={text.data.text} testID={`file-${id}-text`} /> : null}
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({ list: { gap: space.lg }, actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm } });
