// Short names for new jacks, nodes and runs when the technician gives none: a prefix and the next free
// two-digit number ("j-13", "r-14"). Prefixes follow the demo survey's pattern.
import type { NodeKindValue } from '@/db/requests/survey';

export const NODE_REF_PREFIX: Record<NodeKindValue, string> = { block: 'b', jack: 'n', splitter: 's', adapter: 'a' };
export const JACK_REF_PREFIX = 'j';
export const RUN_REF_PREFIX = { wall: 'r', cord: 'c' } as const;

export function nextRef(prefix: string, taken: readonly string[]): string {
  const used = new Set(taken.map((r) => r.toLowerCase()));
  let highest = 0;
  for (const ref of taken) {
    const m = new RegExp(`^${prefix}-(\\d+)$`, 'i').exec(ref);
    if (m) highest = Math.max(highest, Number(m[1]));
  }
  for (let n = highest + 1; ; n += 1) {
    const ref = `${prefix}-${String(n).padStart(2, '0')}`;
    if (!used.has(ref)) return ref;
  }
}
