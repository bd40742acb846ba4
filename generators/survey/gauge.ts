/**
 * Copper wire resistance by gauge.
 *
 * Source: REFERENCES §6.8 [HYPERPHYSICS], the HyperPhysics wire-gauge table taken from Floyd,
 * "Electric Circuit Fundamentals", at 20 °C. (A 25 °C table gives slightly higher figures, e.g.
 * 16.46 Ω for 22 AWG [MACASSEY]; we use the 20 °C basis throughout.)
 * Loop resistance = 2 × conductor resistance × length, because the signal goes out on one conductor
 * of the pair and back on the other.
 */
import type { Gauge } from './types';

/** Ohms per 1,000 ft of one conductor at 20 °C [HYPERPHYSICS]. */
export const OHMS_PER_1000_FT: Readonly<Record<Gauge, number>> = {
  22: 16.14,
  24: 25.67,
  26: 40.81,
};

export const GAUGES: readonly Gauge[] = [22, 24, 26];

export function isGauge(value: unknown): value is Gauge {
  return value === 22 || value === 24 || value === 26;
}

/** Resistance of one conductor of `lengthFt` feet. */
export function conductorOhms(gauge: Gauge, lengthFt: number): number {
  return (OHMS_PER_1000_FT[gauge] * lengthFt) / 1000;
}

/** Resistance of the loop: out on one conductor and back on the other. */
export function loopOhms(gauge: Gauge, lengthFt: number): number {
  return 2 * conductorOhms(gauge, lengthFt);
}
