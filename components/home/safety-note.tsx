import { Banner } from '@/components/ui/banner';

/**
 * The usual cautions of the trade. Voltages: REFERENCES §6.5 (about 48 V DC on an idle US line,
 * [MACASSEY], [TIPRING]) and §6.7 (ringing near 90 V AC, [TIPRING]); precautions §6.10–6.11 ([AVAYA], [LEVITON]).
 */
export function SafetyNote() {
  return (
    <Banner tone="caution" title="Before you touch the wiring" testID="safety-note">
      Telephone pairs can carry about 48 V DC, and ringing near 90 V AC. Test a pair before touching it, never work on
      wiring during a lightning storm, and follow local codes (NEC Article 800 in the US) and licensed practice. Keep a
      boot floppy at hand before changing a PC's startup files.
    </Banner>
  );
}
