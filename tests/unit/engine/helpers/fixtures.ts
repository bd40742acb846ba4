/** Loads the engine fixtures: tests/fixtures/engine/<case>.expect.json with optional .bat, .sys, .profile.json. */
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Profile } from '../../../../generators/engine/profile';

export const FIXTURE_DIR = join(__dirname, '..', '..', '..', 'fixtures', 'engine');

export type DosboxRunSpec = { config?: string; pick?: string };
export type Expect = {
  why: string;
  insertedAt: number | null;
  final: number | null;
  changed: boolean;
  checks: string[];
  boot: string[];
  dosbox: false | { runs?: DosboxRunSpec[] };
  dosboxWhyNot?: string;
};

export type Fixture = { name: string; bat: Buffer | null; sys: Buffer | null; profile: Profile; expect: Expect };

function optional(file: string): Buffer | null {
  return existsSync(file) ? readFileSync(file) : null;
}

/** The default profile (the invented Threadline kit on COM1) with the case's top-level overrides. */
export function loadFixtures(): Fixture[] {
  const base = JSON.parse(readFileSync(join(FIXTURE_DIR, 'default.profile.json'), 'utf8'));
  return readdirSync(FIXTURE_DIR)
    .filter((f) => f.endsWith('.expect.json'))
    .sort()
    .map((f) => {
      const name = f.slice(0, -'.expect.json'.length);
      const over = optional(join(FIXTURE_DIR, `${name}.profile.json`));
      return {
        name,
        bat: optional(join(FIXTURE_DIR, `${name}.bat`)),
        sys: optional(join(FIXTURE_DIR, `${name}.sys`)),
        profile: { ...base, ...(over ? JSON.parse(over.toString('utf8')) : {}) },
        expect: JSON.parse(readFileSync(join(FIXTURE_DIR, f), 'utf8')),
      };
    });
}

/** The same bytes with every line end before the first Ctrl-Z replaced by `eol`. */
export function withLineEnds(bytes: Buffer, eol: '\n' | '\r'): Buffer {
  const text = bytes.toString('latin1');
  const cut = text.indexOf('\x1a');
  const body = cut < 0 ? text : text.slice(0, cut);
  const tail = cut < 0 ? '' : text.slice(cut);
  return Buffer.from(body.replace(/\r\n|\r|\n/g, eol) + tail, 'latin1');
}

/** MENUITEM block names of a CONFIG.SYS, read independently of the engine (REFERENCES 3.13). */
export function menuChoices(sys: Buffer | null): string[] | null {
  if (!sys) return null;
  const names = [...sys.toString('latin1').matchAll(/^[ \t]*menuitem[ \t]*=[ \t]*([^,\s]+)/gim)].map((m) => m[1].toUpperCase());
  return names.length > 0 ? names : null;
}
