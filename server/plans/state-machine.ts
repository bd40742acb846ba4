// The plan revision's life: draft → in_review → approved | returned; approved → released once it goes out in
// a bundle; any state but released → superseded when a newer revision of the station is made. Each move names
// the roles that may make it; the service adds the rules that need data (errors, reasons, self-approval,
// hashes).
import type { PlanState } from '@/db/plans';
import type { Role } from '../roles';

export type PlanAction = 'submit' | 'approve' | 'return' | 'release' | 'supersede' | 'edit-reasons';

type Move = { from: readonly PlanState[]; to: PlanState; roles: readonly Role[] };

export const MOVES: Record<PlanAction, Move> = {
  // Technicians (and admins, who may also make plans) send a draft to the leads.
  submit: { from: ['draft'], to: 'in_review', roles: ['technician', 'admin'] },
  'edit-reasons': { from: ['draft'], to: 'draft', roles: ['technician', 'admin'] },
  // Only a lead reviews (PRODUCT.md: the lead approves the exact diff or returns it).
  approve: { from: ['in_review'], to: 'approved', roles: ['lead'] },
  return: { from: ['in_review'], to: 'returned', roles: ['lead'] },
  // The admin downloads the rollout bundle; that releases the approved plans in it.
  release: { from: ['approved'], to: 'released', roles: ['admin'] },
  // Making a new revision retires the older ones; what already went out stays released.
  supersede: { from: ['draft', 'in_review', 'approved', 'returned'], to: 'superseded', roles: ['technician', 'admin', 'user'] },
};

export type MoveOutcome = { ok: true; to: PlanState } | { ok: false; status: 403 | 409; message: string };

const STATE_WORDS: Record<PlanState, string> = {
  draft: 'a draft',
  in_review: 'in review',
  approved: 'approved',
  returned: 'returned',
  released: 'released',
  superseded: 'superseded by a newer revision',
};

/** Whether `role` may make `action` on a plan in `state`: 403 for the wrong role, 409 for the wrong state. */
export function checkMove(action: PlanAction, state: PlanState, role: Role): MoveOutcome {
  const move = MOVES[action];
  if (!move.roles.includes(role)) return { ok: false, status: 403, message: `Your role may not ${action.replace('-', ' ')} a plan.` };
  if (!move.from.includes(state)) return { ok: false, status: 409, message: `This plan is ${STATE_WORDS[state]}, so it cannot be ${verb(action)} now.` };
  return { ok: true, to: move.to };
}

function verb(action: PlanAction): string {
  return { submit: 'sent for review', approve: 'approved', return: 'returned', release: 'released', supersede: 'superseded', 'edit-reasons': 'edited' }[action];
}
