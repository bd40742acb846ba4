// Startup-file revisions: upload, paste or "this machine has none". Each one is a new row; nothing is
// overwritten, so every plan can name the exact bytes it was computed from.
import { createHash } from 'node:crypto';
import { MAX_UPLOAD_BYTES, type FileKind } from '@/db/requests/stations';
import { decodeCp437 } from '@/generators/dos/cp437';
import { binaryReason } from '@/generators/engine/lines';
import type { AppContext } from '../context';
import { badRequest, HttpError, notFound } from '../http/errors';
import type { SessionUser } from '../http/require-role';
import { describeProblems, encodePastedText } from './pasted-text';
import { createStationRepository, type StationRow } from './repository';

const sha256 = (b: Uint8Array) => createHash('sha256').update(b).digest('hex');

/** Why bytes cannot be a startup file, or null: empty, too large, NUL bytes or mostly control bytes. */
export function uploadProblem(bytes: Uint8Array, kind: FileKind): string | null {
  if (bytes.length === 0) return `The ${kind} you sent is empty. If the machine has no ${kind}, choose “this machine has none”.`;
  if (bytes.length > MAX_UPLOAD_BYTES) return `The file is larger than ${MAX_UPLOAD_BYTES / 1024} KB.`;
  const nul = bytes.indexOf(0);
  if (nul >= 0) {
    return `This is not a text file: it holds a NUL byte at byte ${nul + 1}, so it is a program or a word-processor document. Upload the plain-text ${kind}.`;
  }
  const reason = binaryReason(decodeCp437(bytes));
  return reason ? `This is not a text file: ${reason}. Upload the plain-text ${kind}.` : null;
}

export function createFileService(ctx: AppContext) {
  const repo = createStationRepository(ctx.db);

  function store(actor: SessionUser, st: StationRow, kind: FileKind, bytes: Uint8Array, source: 'upload' | 'paste' | 'user' | 'none') {
    const content = Buffer.from(bytes);
    const row = repo.insertFile({
      stationId: st.id,
      kind,
      absent: source === 'none',
      content,
      sha256: sha256(content),
      size: content.length,
      source,
      uploadedBy: actor.id,
      uploadedAt: new Date(),
    });
    ctx.audit.record(actor, {
      action: source === 'none' ? 'file.none' : `file.${source}`,
      entity: 'startup_file',
      entityId: row.id,
      siteId: st.siteId,
      details: { stationId: st.id, kind, size: row.size, sha256: row.sha256 },
    });
    return row;
  }

  return {
    upload(actor: SessionUser, st: StationRow, kind: FileKind, bytes: Uint8Array | undefined, source: 'upload' | 'user' = 'upload') {
      if (!bytes) throw badRequest('No file arrived. Choose the file and send it in the field named “file”.');
      const problem = uploadProblem(bytes, kind);
      if (problem) throw new HttpError(problem.startsWith('The file is larger') ? 413 : 400, problem.startsWith('This is not') ? 'not_text' : 'bad_upload', problem);
      return store(actor, st, kind, bytes, source);
    },
    paste(actor: SessionUser, st: StationRow, kind: FileKind, text: string, source: 'paste' | 'user' = 'paste') {
      const out = encodePastedText(text);
      if (!out.ok) {
        const fields = Object.fromEntries(out.problems.map((p, i) => [`text.${i}`, `line ${p.line}, column ${p.column}: ${p.codePoint}`]));
        throw new HttpError(400, 'not_cp437', describeProblems(out.problems), { text: describeProblems(out.problems), ...fields });
      }
      const problem = uploadProblem(out.bytes, kind);
      if (problem) throw new HttpError(400, 'bad_upload', problem, { text: problem });
      return store(actor, st, kind, out.bytes, source);
    },
    none: (actor: SessionUser, st: StationRow, kind: FileKind) => store(actor, st, kind, new Uint8Array(0), 'none'),
    list: (stationId: number) => repo.files(stationId),
    /** One revision with its text decoded for display (one character per byte). */
    read(stationId: number, fileId: number) {
      const row = repo.file(stationId, fileId);
      if (!row) throw notFound('That file revision');
      const { content, ...meta } = row;
      return { ...meta, text: row.absent ? null : decodeCp437(content) };
    },
    raw(stationId: number, fileId: number) {
      const row = repo.file(stationId, fileId);
      if (!row || row.absent) throw notFound('That file revision');
      return row;
    },
  };
}
