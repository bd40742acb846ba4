/**
 * The machine profile as the CLI, the API and the wizard accept it (zod 4). Browser-safe: this file and what
 * it imports must stay free of iconv-lite and Node built-ins.
 */
import { z } from 'zod';

/** Serial rates MODE accepts (REFERENCES 1.8, 1.9) [M4] MODEPARS.ASM BAUD_values, [HELP622]. */
export const BAUD_RATES = [110, 150, 300, 600, 1200, 2400, 4800, 9600, 19200] as const;

export const ATTACHED = ['adapter', 'mouse', 'modem', 'printer', 'other', 'none'] as const;
export type Attached = (typeof ATTACHED)[number];

// COM0-COM9 / LPT0-LPT9 pass the schema so that a port DOS does not have (COM5, LPT4) becomes a check the
// screen can show, not a form error.
const portName = z
  .string()
  .trim()
  .toUpperCase()
  .regex(/^(COM|LPT)\d$/, 'a port name such as COM1 or LPT1');

const comName = portName.refine((p) => p.startsWith('COM'), 'a serial port such as COM1');
const lptName = portName.refine((p) => p.startsWith('LPT'), 'a parallel port such as LPT1');

// Lines we write must encode to code page 437 byte for byte; printable ASCII is safe in every code page.
const PRINTABLE = /^[\x20-\x7e]*$/;
const printable = 'printable ASCII characters only';
const dosPath = z.string().trim().min(1).max(127).regex(PRINTABLE, printable);

export const portSchema = z.object({
  name: portName,
  present: z.boolean(),
  attached: z.enum(ATTACHED),
});

export const networkSchema = z.object({
  port: comName,
  baud: z
    .number()
    .int()
    .refine((b) => (BAUD_RATES as readonly number[]).includes(b), 'a baud rate MODE accepts (110 to 19200)'),
  parity: z.string().trim().toUpperCase().pipe(z.enum(['N', 'E', 'O', 'M', 'S'])),
  dataBits: z.union([z.literal(5), z.literal(6), z.literal(7), z.literal(8)]),
  stopBits: z.union([z.literal(1), z.literal(1.5), z.literal(2)]),
});

export const kitSchema = z.object({
  name: z.string().trim().min(1).max(60),
  minDos: z.string().trim().min(1).max(10),
  residentKB: z.number().min(0).max(640),
  files: z.number().int().min(8).max(255).optional(),
  buffers: z.number().int().min(1).max(99).optional(),
  configLines: z.array(z.string().max(127).regex(PRINTABLE, printable)).max(20).optional(),
});

export const profileSchema = z.object({
  /** As VER prints it, e.g. "6.22"; an unknown version becomes a check, not a form error. */
  dos: z.string().trim().min(1).max(10),
  bootDrive: z
    .string()
    .trim()
    .toUpperCase()
    .regex(/^[A-Z]:?$/, 'a drive letter such as C')
    .transform((d) => d[0]),
  dosDir: dosPath,
  ports: z.array(portSchema).max(16),
  network: networkSchema,
  redirect: z.object({ from: lptName, to: comName }).nullable(),
  loader: z.object({ path: dosPath, args: z.string().max(127).regex(PRINTABLE, printable).default('') }),
  /** "auto" (detected), "none", or the 1-based AUTOEXEC.BAT line of the program that may never return. */
  finalProgram: z.union([z.literal('auto'), z.literal('none'), z.number().int().min(1)]).default('auto'),
  loadHigh: z.enum(['auto', 'never']).default('auto'),
  kit: kitSchema.optional(),
  memory: z
    .object({
      freeKB: z.number().min(0).max(1024).optional(),
      mainProgramKB: z.number().min(0).max(1024).optional(),
    })
    .optional(),
});

/** A validated profile (defaults filled in). */
export type Profile = z.output<typeof profileSchema>;
/** What a form or a JSON file may give before defaults are filled in. */
export type ProfileInput = z.input<typeof profileSchema>;
export type PortEntry = Profile['ports'][number];

// Profiles this module validated, frozen so they cannot change afterwards: plan() need not validate them again.
const validated = new WeakSet<object>();

function deepFreeze<T>(value: T): T {
  if (value && typeof value === 'object') {
    for (const v of Object.values(value)) deepFreeze(v);
    Object.freeze(value);
  }
  return value;
}

/** True for a profile returned by parseProfile (validated and frozen). */
export function isValidatedProfile(value: unknown): value is Profile {
  return typeof value === 'object' && value !== null && validated.has(value);
}

/**
 * Validates unknown input; the error is one plain line naming the field, for the CLI and the API.
 * The profile returned is frozen.
 */
export function parseProfile(input: unknown): { ok: true; profile: Profile } | { ok: false; error: string } {
  if (isValidatedProfile(input)) return { ok: true, profile: input };
  const result = profileSchema.safeParse(input);
  if (result.success) {
    const profile = deepFreeze(result.data);
    validated.add(profile);
    return { ok: true, profile };
  }
  const issue = result.error.issues[0];
  const where = issue.path.length > 0 ? issue.path.join('.') : 'profile';
  return { ok: false, error: `${where}: ${issue.message}` };
}
