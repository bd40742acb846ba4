// The download's file name: 8.3-safe on every DOS version (the zip is often unpacked on the PCs' own
// machines), from the site's name and the record number, e.g. HALV0007.ZIP.
import { isValid83Name } from '@/generators/dos/names';

/** Up to four letters or digits of the site's name, then the record number; BNDL when the name has none. */
export function bundleFileName(siteName: string, recordId: number): string {
  const digits = String(recordId).padStart(4, '0');
  const room = Math.max(0, 8 - digits.length);
  const letters = siteName.normalize('NFD').toUpperCase().replace(/[^A-Z0-9]/g, '').slice(0, room) || 'BNDL'.slice(0, room);
  const name = `${letters}${digits}`.slice(-8);
  const file = `${name}.ZIP`;
  if (!isValid83Name(file)) throw new Error(`${file} is not a valid 8.3 name`);
  return file;
}
