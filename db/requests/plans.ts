// Request schemas for plan revisions, the review and the office user's checked edit, shared by the server
// and the app's forms (zod only: the browser imports this file).
import { z } from 'zod';

export const PLAN_STATE_VALUES = ['draft', 'in_review', 'approved', 'returned', 'released', 'superseded'] as const;
export type PlanStateValue = (typeof PLAN_STATE_VALUES)[number];

export const STARTUP_FILES = ['AUTOEXEC.BAT', 'CONFIG.SYS'] as const;

/** Plain words for each state, shown with a symbol so the state never rests on colour alone. */
export const PLAN_STATE_LABELS: Record<PlanStateValue, { mark: string; word: string }> = {
  draft: { mark: '✎', word: 'Draft' },
  in_review: { mark: '…', word: 'In review' },
  approved: { mark: '✓', word: 'Approved' },
  returned: { mark: '↩', word: 'Returned' },
  released: { mark: '⇪', word: 'Released' },
  superseded: { mark: '⊘', word: 'Superseded' },
};

/** The key a technician's reason is stored under: one per warning (slug, file and line). */
export function checkKey(check: { slug: string; file: string | null; line: number | null }): string {
  return `${check.slug}|${check.file ?? '-'}|${check.line ?? '-'}`;
}

export const REASON_MAX = 500;
export const COMMENT_MAX = 2000;

const version = z.number().int().min(1);
const sha256 = z.string().regex(/^[0-9a-f]{64}$/, 'a SHA-256 in hex');
const reason = z.string().trim().min(1, 'Write why this warning is acceptable.').max(REASON_MAX, `Keep it under ${REASON_MAX} characters.`);

export const reasonsSchema = z.record(z.string().min(1).max(200), reason);

export const createPlanSchema = z.object({ stationId: z.number().int().positive() });

export const saveReasonsSchema = z.object({ version, reasons: reasonsSchema });

export const submitPlanSchema = z.object({ version, reasons: reasonsSchema.optional() });

export const approvePlanSchema = z.object({
  version,
  /** The plan hash the lead saw: the approval holds for exactly this content. */
  planHash: sha256,
  comment: z.string().trim().max(COMMENT_MAX).optional(),
});

export const returnPlanSchema = z.object({
  version,
  comment: z.string().trim().min(1, 'Say what needs to change.').max(COMMENT_MAX, `Keep it under ${COMMENT_MAX} characters.`),
});
export type ReturnPlanInput = z.infer<typeof returnPlanSchema>;

export const commentSchema = z
  .object({
    file: z.enum(STARTUP_FILES).nullable().default(null),
    /** A line of the patched (new) file. */
    line: z.number().int().min(1).max(100_000).nullable().default(null),
    body: z.string().trim().min(1, 'Write the comment.').max(COMMENT_MAX, `Keep it under ${COMMENT_MAX} characters.`),
  })
  .refine((c) => c.line == null || c.file != null, { path: ['file'], message: 'A line comment names its file.' });
export type CommentInput = z.input<typeof commentSchema>;

export const planListQuery = z.object({
  stationId: z.coerce.number().int().positive().optional(),
  siteId: z.coerce.number().int().positive().optional(),
  state: z.enum(PLAN_STATE_VALUES).optional(),
});

export const reviewQueueQuery = z.object({ siteId: z.coerce.number().int().positive().optional() });

/** A startup file the office user pastes (text) or uploads (bytes as base64, so code page 437 survives). */
export const USER_FILE_MAX_BYTES = 64 * 1024;
export const userFileSchema = z.discriminatedUnion('encoding', [
  z.object({ encoding: z.literal('text'), data: z.string().max(USER_FILE_MAX_BYTES, 'That is too long for a startup file (64 KB at most).') }),
  z.object({
    encoding: z.literal('base64'),
    data: z
      .string()
      .max(Math.ceil(USER_FILE_MAX_BYTES / 3) * 4, 'That file is too large for a startup file (64 KB at most).')
      .regex(/^[A-Za-z0-9+/]*={0,2}$/, 'The upload is damaged; try again.'),
  }),
]);
export type UserFile = z.infer<typeof userFileSchema>;

export const userEditSchema = z.object({
  autoexec: userFileSchema.refine((f) => f.data.trim().length > 0, 'Paste or upload your AUTOEXEC.BAT.'),
  /** Leave out to keep the CONFIG.SYS on record. */
  config: userFileSchema.nullish(),
});
export type UserEditInput = z.infer<typeof userEditSchema>;

/** An uploaded file as the form keeps it: its name, size and bytes in base64. */
export const uploadSchema = z.object({ name: z.string().max(255), size: z.number().int().min(0).max(USER_FILE_MAX_BYTES, 'That file is too large for a startup file (64 KB at most).'), data: z.string() });
export type Upload = z.infer<typeof uploadSchema>;

const formText = z.string().max(USER_FILE_MAX_BYTES, 'That is too long for a startup file (64 KB at most).');

/** The checked-edit form: each file is pasted text or an upload (an upload wins). */
export const userEditFormSchema = z
  .object({ autoexec: formText, config: formText, autoexecUpload: uploadSchema.nullable(), configUpload: uploadSchema.nullable() })
  .refine((v) => v.autoexecUpload != null || v.autoexec.trim().length > 0, { path: ['autoexec'], message: 'Paste or upload your AUTOEXEC.BAT.' });
export type UserEditForm = z.infer<typeof userEditFormSchema>;

/** The request the form's values make. */
export function userEditRequest(v: UserEditForm): UserEditInput {
  const file = (text: string, upload: Upload | null): UserFile | null =>
    upload ? { encoding: 'base64', data: upload.data } : text.trim() ? { encoding: 'text', data: text } : null;
  return { autoexec: file(v.autoexec, v.autoexecUpload)!, config: file(v.config, v.configUpload) };
}

/** The technician's reasons, one per warning in the plan's order (keys hold dots, so not field names). */
export const reasonsFormSchema = z.object({ reasons: z.array(reason) });
export type ReasonsForm = z.infer<typeof reasonsFormSchema>;

/** The lead's decision comment: optional to approve, required to return (returnPlanSchema). */
export const decisionFormSchema = z.object({ comment: z.string().trim().max(COMMENT_MAX, `Keep it under ${COMMENT_MAX} characters.`) });
export type DecisionForm = z.infer<typeof decisionFormSchema>;

export const commentFormSchema = z.object({ body: commentSchema.shape.body });
export type CommentForm = z.infer<typeof commentFormSchema>;
