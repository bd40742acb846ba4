// Picks one file from the device and returns its bytes as base64, so code page 437 bytes are sent exactly.
import * as DocumentPicker from 'expo-document-picker';
import type { Upload } from '@/db/requests/plans';

export async function pickStartupFile(): Promise<Upload | null> {
  const res = await DocumentPicker.getDocumentAsync({ type: '*/*', multiple: false, base64: true, copyToCacheDirectory: false });
  if (res.canceled || !res.assets?.[0]) return null;
  const a = res.assets[0];
  // On the web the picker gives a data: URL; keep only the base64 after the comma.
  const raw = a.base64 ?? '';
  const data = raw.includes(',') ? raw.slice(raw.indexOf(',') + 1) : raw;
  return { name: a.name, size: a.size ?? Math.floor((data.length * 3) / 4), data };
}
