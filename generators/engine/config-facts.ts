/**
 * What AUTOEXEC.BAT planning needs to know from CONFIG.SYS: does it provide upper memory (DOS=UMB,
 * REFERENCES 3.10 [HELP622] Dos), and which block names a DOS 6 startup menu can put in %CONFIG%
 * (MENUITEM=block[,text], 2.23 and 3.13).
 */
import type { ConfigModel } from './model';

export type ConfigFacts = { upperMemory: boolean; choices: string[] | null };

export function configFacts(model: ConfigModel | null): ConfigFacts {
  if (!model) return { upperMemory: false, choices: null };
  let upperMemory = false;
  const choices: string[] = [];
  for (const line of model.lines) {
    const s = line.stmt;
    if (s.kind !== 'directive') continue;
    if (s.name === 'DOS') {
      const words = s.value.toUpperCase().split(/[\s,]+/);
      if (words.includes('UMB')) upperMemory = true;
    }
    if (s.name === 'MENUITEM') {
      const name = s.value.split(',')[0].trim().toUpperCase();
      if (name && !choices.includes(name)) choices.push(name);
    }
  }
  return { upperMemory, choices: choices.length > 0 ? choices : null };
}
