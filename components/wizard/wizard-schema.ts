// The profile wizard's form: one zod schema for every step's fields (strings where the technician types),
// and the conversions between the form, the stored draft and the engine's profile for live checks.
import { z } from 'zod';
import { dosVersionSchema } from '@/db/requests/kits';
import type { ProfileDraft, WizardStep } from '@/db/requests/stations';
import { pathProblems } from '@/generators/engine/dos-path';
import { ATTACHED, BAUD_RATES, profileSchema, type Profile } from '@/generators/engine/profile';
import type { Kit } from '@/hooks/use-kits';

export const PORT_NAMES = ['COM1', 'COM2', 'COM3', 'COM4', 'LPT1', 'LPT2', 'LPT3'] as const;
export const COM_PORTS = ['COM1', 'COM2', 'COM3', 'COM4'] as const;
export const LPT_PORTS = ['LPT1', 'LPT2', 'LPT3'] as const;

const kbField = z
  .string()
  .trim()
  .refine((v) => v === '' || (/^\d{1,4}$/.test(v) && Number(v) <= 1024), 'Enter KB as a whole number up to 1024, or leave it empty.');

export const wizardFormSchema = z.object({
  dos: dosVersionSchema,
  bootDrive: z
    .string()
    .trim()
    .regex(/^[A-Za-z]:?$/, 'One drive letter, like C.'),
  dosDir: z
    .string()
    .trim()
    .min(1, 'Enter the folder DOS is in, like C:\\DOS.')
    .max(127)
    .regex(/^[A-Za-z]:\\/, 'Start with the drive, like C:\\DOS.')
    .superRefine((p, ctx) => {
      const bad = pathProblems(p)[0];
      if (bad) ctx.addIssue({ code: 'custom', message: `${bad.part}: ${bad.reason}` });
    }),
  freeKB: kbField,
  mainProgramKB: kbField,
  ports: z.array(z.object({ name: z.enum(PORT_NAMES), present: z.boolean(), attached: z.enum(ATTACHED) })).length(PORT_NAMES.length),
  networkPort: z.enum(COM_PORTS),
  baud: z.number().refine((b) => (BAUD_RATES as readonly number[]).includes(b)),
  parity: z.enum(['N', 'E', 'O', 'M', 'S']),
  dataBits: z.union([z.literal(5), z.literal(6), z.literal(7), z.literal(8)]),
  stopBits: z.union([z.literal(1), z.literal(1.5), z.literal(2)]),
  redirectFrom: z.enum(['none', ...LPT_PORTS]),
  stationArgs: z.string().trim().max(60, 'At most 60 characters.'),
  loadHigh: z.enum(['auto', 'never']),
  finalProgram: z.union([z.literal('auto'), z.literal('none'), z.number().int().min(1)]),
});
export type WizardForm = z.infer<typeof wizardFormSchema>;

/** The form fields each step owns, for validating one step at a time. */
export const STEP_FIELDS: Record<Exclude<WizardStep, 'identity'>, (keyof WizardForm)[]> = {
  dos: ['dos', 'bootDrive', 'dosDir', 'freeKB', 'mainProgramKB'],
  ports: ['ports'],
  network: ['networkPort', 'baud', 'parity', 'dataBits', 'stopBits', 'redirectFrom', 'stationArgs', 'loadHigh'],
  files: [],
  final: ['finalProgram'],
  preview: [],
};

const kb = (v: string) => (v.trim() === '' ? undefined : Number(v));

/** The stored draft for the form's values. */
export function toDraft(v: WizardForm): ProfileDraft {
  const freeKB = kb(v.freeKB);
  const mainProgramKB = kb(v.mainProgramKB);
  return {
    dos: v.dos.trim() || undefined,
    bootDrive: v.bootDrive.trim() ? v.bootDrive.trim().toUpperCase()[0] : undefined,
    dosDir: v.dosDir.trim() || undefined,
    ports: v.ports,
    network: { port: v.networkPort, baud: v.baud, parity: v.parity, dataBits: v.dataBits, stopBits: v.stopBits },
    redirect: v.redirectFrom === 'none' ? null : { from: v.redirectFrom, to: v.networkPort },
    loader: { args: v.stationArgs.trim() },
    finalProgram: v.finalProgram,
    loadHigh: v.loadHigh,
    ...(freeKB !== undefined || mainProgramKB !== undefined ? { memory: { freeKB, mainProgramKB } } : {}),
  };
}

/** Form values from a stored draft, the kit's serial settings and sensible first guesses. */
export function fromDraft(d: ProfileDraft, kit: Kit | null, stationNumber: number): WizardForm {
  const ports = PORT_NAMES.map((name) => {
    const saved = d.ports?.find((p) => p.name === name);
    if (saved) return { name, present: saved.present, attached: saved.attached };
    // Most PCs of the era have COM1, COM2 and LPT1; the technician corrects the rest.
    const common = name === 'COM1' || name === 'COM2' || name === 'LPT1';
    return { name, present: common, attached: 'none' as const };
  });
  const port = (d.network?.port as WizardForm['networkPort'] | undefined) ?? 'COM1';
  return {
    dos: d.dos ?? '',
    bootDrive: d.bootDrive ?? 'C',
    dosDir: d.dosDir ?? 'C:\\DOS',
    freeKB: d.memory?.freeKB !== undefined ? String(d.memory.freeKB) : '',
    mainProgramKB: d.memory?.mainProgramKB !== undefined ? String(d.memory.mainProgramKB) : '',
    ports,
    networkPort: port,
    baud: d.network?.baud ?? kit?.baud ?? 9600,
    parity: (d.network?.parity as WizardForm['parity'] | undefined) ?? kit?.parity ?? 'N',
    dataBits: (d.network?.dataBits ?? kit?.dataBits ?? 8) as WizardForm['dataBits'],
    stopBits: (d.network?.stopBits ?? kit?.stopBits ?? 1) as WizardForm['stopBits'],
    redirectFrom: d.redirect === null ? 'none' : ((d.redirect?.from as WizardForm['redirectFrom'] | undefined) ?? 'LPT1'),
    stationArgs: d.loader?.args ?? `/S:${stationNumber}`,
    loadHigh: d.loadHigh ?? 'auto',
    finalProgram: d.finalProgram ?? 'auto',
  };
}

/** Station options first, then the kit's options not already given (the server merges the same way). */
export function mergeArgs(stationArgs: string, kitArgs: string): string {
  const own = stationArgs.split(/\s+/).filter(Boolean);
  const seen = new Set(own.map((a) => a.toUpperCase()));
  return [...own, ...kitArgs.split(/\s+/).filter((a) => a && !seen.has(a.toUpperCase()))].join(' ');
}

/** The engine profile for the form and kit, for the live checks; null while a field is not usable yet. */
export function provisionalProfile(v: WizardForm, kit: Kit | null): Profile | null {
  const d = toDraft(v);
  const parsed = profileSchema.safeParse({
    ...d,
    loader: { path: kit?.programPath ?? 'C:\\NET\\LOADER.COM', args: mergeArgs(v.stationArgs, kit?.programArgs ?? '') },
    ...(kit
      ? {
          kit: {
            name: kit.name,
            minDos: kit.minDos,
            residentKB: kit.residentKB,
            ...(kit.configFiles != null ? { files: kit.configFiles } : {}),
            ...(kit.configBuffers != null ? { buffers: kit.configBuffers } : {}),
            ...(kit.configLines.length ? { configLines: kit.configLines } : {}),
          },
        }
      : {}),
  });
  return parsed.success ? parsed.data : null;
}
