// Turns what an office user pasted or uploaded into DOS file bytes: pasted text gets CR LF line ends (what
// DOS writes) and must fit code page 437; uploaded bytes are kept exactly.
import type { UserFile } from '@/db/requests/plans';
import { USER_FILE_MAX_BYTES } from '@/db/requests/plans';
import { encodeCp437, isCp437Text } from '@/generators/dos/cp437';
import { badRequest } from '../http/errors';

export function userFileBytes(file: UserFile, field: string): Uint8Array {
  if (file.encoding === 'base64') {
    const bytes = new Uint8Array(Buffer.from(file.data, 'base64'));
    if (bytes.length > USER_FILE_MAX_BYTES) throw badRequest('That file is too large.', { [field]: 'A startup file has at most 64 KB.' });
    return bytes;
  }
  const text = file.data.replace(/\r?\n/g, '\r\n');
  if (!isCp437Text(text)) {
    const bad = [...text].find((c) => !isCp437Text(c)) ?? '?';
    throw badRequest('The text has a character DOS cannot store.', { [field]: `“${bad}” is not in the DOS character set (code page 437). Paste the file as it is on the PC.` });
  }
  return encodeCp437(text);
}
