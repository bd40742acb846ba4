/**
 * The trade's limits for a network over a spare telephone pair.
 *
 * Common practice of the trade, told to us by a practitioner: there is no published source for these
 * figures. Where this file interprets a rule beyond its plain words, the comment says so.
 */

/** A pair reading more than this many volts DC (either polarity) is probably in use. */
export const IN_USE_VDC = 0.3;
/** A pair reading more than this many volts AC is probably in use. */
export const IN_USE_VAC = 1;

/** Each spoke of a star, measured from the centre. */
export const STAR_SPOKE_MAX_FT = 500;
/** A bus (and, in our reading, any layout that is not a star) in total. */
export const BUS_TOTAL_MAX_FT = 4000;
/** The bus total when only 24 AWG wire is used. We apply it whenever the wall wiring has no 22 AWG run
 * (all 24, or 24 and 26): thinner wire can only be worse. That extension is our own reading. */
export const BUS_TOTAL_24AWG_MAX_FT = 2500;

/** New runs should be 22 AWG. */
export const NEW_RUN_GAUGE = 22;

/** The terminating resistor's value, ohms. */
export const TERMINATOR_OHMS = 150;
/** From this total length of wire on, exactly one terminator is needed; under it, none. */
export const TERMINATOR_NEEDED_FROM_FT = 100;

/**
 * Bounds beyond which a meter reading is questioned as a likely typing or meter-range mistake.
 * Our own choice, not a trade rule: the highest voltages a telephone pair carries are the ~48 V DC
 * battery and ~90 V AC ringing (REFERENCES 6.5, 6.7 [MACASSEY] [TIPRING]); 150 V leaves room for both.
 */
export const READING_MAX_ABS_VDC = 150;
export const READING_MAX_VAC = 150;

/** Sums of lengths are compared with this slack so that 33.3 + 33.3 + 33.4 counts as 100 ft. */
export const LENGTH_EPSILON_FT = 1e-9;

/** `value` is over `limit`, allowing for floating-point noise in sums. */
export function overLimit(value: number, limit: number): boolean {
  return value > limit + LENGTH_EPSILON_FT;
}

/** `value` is at or over `limit`, allowing for floating-point noise in sums. */
export function atLeast(value: number, limit: number): boolean {
  return value >= limit - LENGTH_EPSILON_FT;
}
