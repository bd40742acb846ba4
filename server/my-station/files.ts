// Turns what an office user pasted or uploaded into DOS file bytes with the stations' own rules (issue 4's
// paste encoder and upload checks): pasted text gets CR LF line ends and must fit code page 437; uploaded
// bytes are kept exactly. Problems come back under the form's field name.
import type { UserFile } from '@/db/requests/plans';
import type { FileKind } from '@/db/requests/stations';
import { badRequest } from '../http/errors';
import { uploadProblem } from '../stations/files';
import { describeProblems, encodePastedText } from '../stations/pasted-text';

export function userFileBytes(file: UserFile, kind: FileKind, field: string): Uint8Array {
  let bytes: Uint8Array;
  if (file.encoding === 'base64') bytes = new Uint8Array(Buffer.from(file.data, 'base64'));
  else {
    const out = encodePastedText(file.data);
    if (!out.ok) throw badRequest('The text has characters DOS cannot store.', { [field]: `${describeProblems(out.problems)} (code page 437)` });
    bytes = out.bytes;
  }
  const problem = uploadProblem(bytes, kind);
  if (problem) throw badRequest(problem, { [field]: problem });
  return bytes;
}
