// The next free station number for each kind, from the site's number ranges.
import { STATION_KINDS, type StationKind } from '@/db/requests/sites';
import type { NumberRanges } from '@/db/sites';

/**
 * The lowest number in each kind's range that no station of the site holds (archived stations keep their
 * numbers, so a number is never given twice); null when the range is full.
 */
export function nextFreeNumbers(ranges: NumberRanges, used: readonly number[]): Record<StationKind, number | null> {
  const taken = new Set(used);
  const out = {} as Record<StationKind, number | null>;
  for (const kind of STATION_KINDS) {
    const [first, last] = ranges[kind];
    let found: number | null = null;
    for (let n = first; n <= last; n++) {
      if (!taken.has(n)) {
        found = n;
        break;
      }
    }
    out[kind] = found;
  }
  return out;
}
