// What an approval pins: the SHA-256 of every input (profile, kit, original files) and output (patched
// files), and one plan hash over all of them. A plan still holds when the station's inputs hash the same now.
import { canonicalJson, sha256, type PlanInputBundle } from '../stations/plan-input';
import type { PlanRow } from './repository';

/** Stored for a station without a kit, so the column always says something. */
export const NO_KIT = 'no-kit';

export type InputHashes = { profileHash: string; kitHash: string; autoexecInHash: string | null; configInHash: string | null };
export type OutputHashes = { autoexecOutHash: string; configOutHash: string | null };

export function inputHashes(input: Pick<PlanInputBundle, 'hashes'>): InputHashes {
  const h = input.hashes;
  return { profileHash: h.profile, kitHash: h.kit ?? NO_KIT, autoexecInHash: h.autoexecIn, configInHash: h.configIn };
}

/** One hash over the station and every input and output hash, keys sorted. */
export function planHash(stationId: number, inputs: InputHashes, outputs: OutputHashes): string {
  return sha256(canonicalJson({ stationId, ...inputs, ...outputs }));
}

export type InputPart = 'profile' | 'kit' | 'AUTOEXEC.BAT' | 'CONFIG.SYS';

/** Which inputs differ between what the plan was made from and what the station has now. */
export function changedInputs(plan: Pick<PlanRow, keyof InputHashes>, now: InputHashes): InputPart[] {
  const out: InputPart[] = [];
  if (plan.profileHash !== now.profileHash) out.push('profile');
  if (plan.kitHash !== now.kitHash) out.push('kit');
  if (plan.autoexecInHash !== now.autoexecInHash) out.push('AUTOEXEC.BAT');
  if (plan.configInHash !== now.configInHash) out.push('CONFIG.SYS');
  return out;
}
