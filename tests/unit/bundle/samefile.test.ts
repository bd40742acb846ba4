/**
 * SAMEFILE.COM: the builder's checked-in bytes are exactly what Debian's nasm makes of samefile.asm, and
 * the program answers in ERRORLEVEL (0 same, 1 different, 2 missing or unreadable) when DOSBox (Debian
 * `dosbox`, headless, REFERENCES §7) runs it: IF ERRORLEVEL n is true for n and above (REFERENCES 7.3).
 */
import { execFileSync } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { SAMEFILE_COM } from '@/generators/bundle';
import { requireProgram, runDosboxLines } from '@/tests/support/bundle-dosbox';
import { tempDir } from '@/tests/support/bundle-zip';

const ASM = join(__dirname, '..', '..', '..', 'generators', 'bundle', 'samefile.asm');

describe('SAMEFILE.COM', () => {
  it('is byte for byte what nasm assembles from samefile.asm', () => {
    requireProgram('nasm', 'nasm');
    const out = join(tempDir('bw-samefile-'), 'SAMEFILE.COM');
    execFileSync('nasm', ['-f', 'bin', '-o', out, ASM]);
    expect(Buffer.from(SAMEFILE_COM).equals(readFileSync(out))).toBe(true);
    expect(SAMEFILE_COM.length).toBeLessThan(512);
  });

  it('sets ERRORLEVEL 0 for same bytes, 1 for different, 2 for a missing name or file (DOSBox)', () => {
    const root = tempDir('bw-samefile-c-');
    const big = Buffer.alloc(3000, 0);
    for (let i = 0; i < big.length; i++) big[i] = (i * 7 + 3) & 0xff;
    const bigLate = Buffer.from(big);
    bigLate[1700] ^= 0x01; // a difference in the fourth 512-byte chunk
    const files: Record<string, Buffer> = {
      'A.TXT': Buffer.from('PATH C:\\DOS\r\n'),
      'B.TXT': Buffer.from('PATH C:\\DOS\r\n'),
      'C.TXT': Buffer.from('PATH C:\\DOT\r\n'),
      'LONGER.TXT': Buffer.from('PATH C:\\DOS\r\nMORE\r\n'),
      'EMPTY1.TXT': Buffer.alloc(0),
      'EMPTY2.TXT': Buffer.alloc(0),
      'BIG1.BIN': big,
      'BIG2.BIN': Buffer.from(big),
      'BIG3.BIN': bigLate,
      'SAMEFILE.COM': Buffer.from(SAMEFILE_COM),
    };
    for (const [name, bytes] of Object.entries(files)) writeFileSync(join(root, name), bytes);
    const cases: Array<[string, string, number]> = [
      ['R01', 'A.TXT B.TXT', 0],
      ['R02', 'A.TXT C.TXT', 1],
      ['R03', 'A.TXT LONGER.TXT', 1],
      ['R04', 'LONGER.TXT A.TXT', 1],
      ['R05', 'EMPTY1.TXT EMPTY2.TXT', 0],
      ['R06', 'EMPTY1.TXT A.TXT', 1],
      ['R07', 'BIG1.BIN BIG2.BIN', 0],
      ['R08', 'BIG1.BIN BIG3.BIN', 1],
      ['R09', 'A.TXT NOFILE.TXT', 2],
      ['R10', 'NOFILE.TXT A.TXT', 2],
      ['R11', 'A.TXT', 2],
      ['R12', '', 2],
      ['R13', '  A.TXT \t  B.TXT  ', 0],
      ['R14', 'C:\\A.TXT c:\\b.txt', 0],
      ['R15', 'A.TXT C:\\', 2],
    ];
    // Each result is read right after SAMEFILE and branched on with GOTO: in DOSBox an ECHO with a
    // redirection leaves ERRORLEVEL at 0 (seen here), so a later IF ERRORLEVEL would not see SAMEFILE's.
    const batch = cases.flatMap(([id, args]) => [
      `SAMEFILE${args === '' ? '' : ` ${args}`}`,
      `IF ERRORLEVEL 2 GOTO ${id}E2`,
      `IF ERRORLEVEL 1 GOTO ${id}E1`,
      `ECHO 0 > ${id}.TXT`,
      `GOTO ${id}END`,
      `:${id}E2`,
      `ECHO 2 > ${id}.TXT`,
      `GOTO ${id}END`,
      `:${id}E1`,
      `ECHO 1 > ${id}.TXT`,
      `:${id}END`,
    ]);
    writeFileSync(join(root, 'T.BAT'), `${batch.join('\r\n')}\r\n`, 'latin1');
    const result = runDosboxLines([`mount c ${root}`, 'c:', 'CALL T.BAT'], 30_000);
    expect(result.timedOut).toBe(false);
    const seen = cases.map(([id, args]) => [id, args, Number(readFileSync(join(root, `${id}.TXT`), 'latin1').trim())]);
    expect(seen).toEqual(cases);
  });
});
