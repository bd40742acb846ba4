/**
 * The cautions every sheet and the README carry. Where the work can hurt someone or leave a PC unable to
 * start, the bundle says so and defers to local codes and licensed practice.
 * Voltages: REFERENCES 6.5 ([MACASSEY], [TIPRING]: about 48 V DC on-hook) and 6.7 ([TIPRING],
 * [ACTIONTEC]: ringing about 90 V AC); precautions 6.10 ([AVAYA]) and 6.11 ([LEVITON]).
 */
export const CAUTIONS: readonly string[] = [
  'A bad startup file can leave the PC unable to start. Keep a boot floppy for this PC at hand before you begin.',
  'INSTALL keeps the old files in a new backup folder on the boot drive (BWSAVE\\001, 002, ...) and never ' +
    'overwrites an earlier backup. UNDO puts the newest backup back.',
  'Telephone pairs can carry about 48 V DC and ringing voltage near 90 V AC, even with every phone unplugged. ' +
    'Test a pair before touching it, do not work on wiring during a lightning storm, and follow local codes ' +
    'and licensed practice.',
];
