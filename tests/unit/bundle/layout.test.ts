/**
 * Entry names of the bundle: every part 8.3-valid under names.ts AND under an independent regex written
 * from REFERENCES 5.2–5.4 ([M4D] FCB.ASM: 8 + 3 characters, forbidden characters; [M4S] MSBDATA.INC and
 * [M4D] MSCONST.ASM: device names), unique after upper-casing, and folder names derived deterministically.
 */
import fc from 'fast-check';
import { bundleLayout, demoBundleSite, placePcs } from '@/generators/bundle';
import type { BundlePc, BundleSite } from '@/generators/bundle';
import { isValid83Name } from '@/generators/dos/names';

// Independent of names.ts: 1–8 allowed characters, optional dot and 1–3 more; allowed = not a control
// code, space, or any of " / \ [ ] : | < > + = ; , . * ? ([M4D] FCB.ASM CharType, REFERENCES 5.3).
const PART = String.raw`[^\x00-\x20"/\\\[\]:|<>+=;,.*?]`;
const NAME_83 = new RegExp(`^${PART}{1,8}(\\.${PART}{1,3})?$`);
// REFERENCES 5.4: CON, AUX, PRN, CLOCK$, COM1–COM4, LPT1–LPT3, NUL; 5.5: with any extension too.
const DEVICE = /^(CON|AUX|PRN|NUL|CLOCK\$|COM[1-4]|LPT[1-3])(\.|$)/i;

/** Every reason a name breaks the rules; an empty list when all are fine (one expect, fast on 9,000 names). */
function nameProblems(names: string[]): string[] {
  const problems: string[] = [];
  const upper = names.map((n) => n.toUpperCase());
  if (new Set(upper).size !== names.length) problems.push('names repeat after upper-casing');
  for (const name of names) {
    const parts = name.split('/');
    if (parts.length > 2) problems.push(`${name}: nested deeper than one folder`);
    for (const part of parts) {
      if (!isValid83Name(part)) problems.push(`${name}: names.ts rejects ${part}`);
      if (!NAME_83.test(part)) problems.push(`${name}: regex rejects ${part}`);
      if (DEVICE.test(part)) problems.push(`${name}: device name ${part}`);
    }
  }
  return problems;
}

function checkNames(names: string[]): void {
  expect(nameProblems(names)).toEqual([]);
}

function pcNamed(base: BundlePc, stationName: string, stationNumber: number): BundlePc {
  return { ...base, stationName, stationNumber };
}

describe('bundle layout', () => {
  it('names every entry of the demo site with valid, unique 8.3 parts, site files first and the manifest last', () => {
    const site = demoBundleSite();
    const names = bundleLayout(site);
    checkNames(names);
    expect(names.slice(0, 3)).toEqual(['README.TXT', 'STATIONS.TXT', 'SURVEY.TXT']);
    expect(names[names.length - 1]).toBe('MANIFEST.CSV');
    expect(names).toContain('RECEPT/INSTALL.BAT');
    expect(names).toContain('RECEPT/SAMEFILE.COM');
  });

  it('keeps originals, CONFIG.SYS and CONFIG.OLD only where they exist', () => {
    const site = demoBundleSite();
    const names = bundleLayout(site);
    // PRINCIPL (DOS 3.30) had no CONFIG.SYS, the plan adds one; DRAFT2 had no AUTOEXEC.BAT; DRAFT1's plan leaves CONFIG.SYS.
    expect(names).toContain('PRINCIPL/CONFIG.SYS');
    expect(names).not.toContain('PRINCIPL/CONFIG.OLD');
    expect(names).not.toContain('DRAFT2/AUTOEXEC.OLD');
    expect(names).toContain('DRAFT2/AUTOEXEC.BAT');
    expect(names).not.toContain('DRAFT1/CONFIG.SYS');
    expect(names).toContain('DRAFT1/CONFIG.OLD');
  });

  it('derives folders from hostile station names without dots, slashes or device names, collisions numbered in station order', () => {
    const base = demoBundleSite().pcs[0];
    const site: BundleSite = {
      ...demoBundleSite(),
      pcs: [
        pcNamed(base, 'Drafting desk 1', 7),
        pcNamed(base, 'drafting desk 2', 8),
        pcNamed(base, 'DRAFTING-9', 9),
        pcNamed(base, 'CON', 10),
        pcNamed(base, '../../etc', 11),
        pcNamed(base, 'a\\b/c:d', 12),
        pcNamed(base, '***', 13),
        pcNamed(base, 'Réception', 14),
        pcNamed(base, 'LPT1', 15),
        pcNamed(base, 'Aux', 16),
      ],
    };
    const folders = placePcs(site).map((p) => p.folder);
    expect(folders).toEqual(['DRAFTING', 'DRAFTI~2', 'DRAFTI~3', 'ST10', 'ETC', 'ABCD', 'ST13', 'RECEPTIO', 'ST15', 'ST16']);
    checkNames(bundleLayout(site));
    // Same input in another order: same folder for each station (sorted by number before naming).
    const shuffled = { ...site, pcs: [...site.pcs].reverse() };
    expect(placePcs(shuffled).map((p) => [p.pc.stationNumber, p.folder])).toEqual(
      placePcs(site).map((p) => [p.pc.stationNumber, p.folder]),
    );
  });

  it('the checks above can fail: they catch a device name, a long name and a repeat', () => {
    expect(nameProblems(['CON/X.TXT', 'ABCDEFGHI.TXT', 'a/B.TXT', 'A/b.txt'])).toEqual([
      'names repeat after upper-casing',
      'CON/X.TXT: names.ts rejects CON',
      'CON/X.TXT: device name CON',
      'ABCDEFGHI.TXT: names.ts rejects ABCDEFGHI.TXT',
      'ABCDEFGHI.TXT: regex rejects ABCDEFGHI.TXT',
    ]);
  });

  it('property: any station names give valid, unique entry names', () => {
    const demo = demoBundleSite();
    const base = demo.pcs[0];
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.string({ unit: 'binary', maxLength: 20 }), fc.integer({ min: -5, max: 100000 })), { minLength: 1, maxLength: 60 }),
        (stations) => {
          const site = { ...demo, pcs: stations.map(([name, number]) => pcNamed(base, name, number)) };
          return nameProblems(bundleLayout(site)).length === 0;
        },
      ),
      { numRuns: 200 },
    );
  });

  it('a 1,000-station site still has unique names (many desks share the first 8 letters)', () => {
    const names = bundleLayout(demoBundleSite(1000));
    checkNames(names);
    expect(names.length).toBeGreaterThan(8000);
  });
});
