/**
 * Which characters code page 437 can print, without a Buffer (this also runs in the browser).
 * The upper half is written out from the IBM PC character set; a test compares it byte for byte with
 * iconv-lite's cp437 table, which report.ts uses to encode.
 */

/** Characters 0x80-0xFF of code page 437, in order (0xFF is the no-break space). */
export const CP437_UPPER =
  'ÇüéâäàåçêëèïîìÄÅ' +
  'ÉæÆôöòûùÿÖÜ¢£¥₧ƒ' +
  'áíóúñÑªº¿⌐¬½¼¡«»' +
  '░▒▓│┤╡╢╖╕╣║╗╝╜╛┐' +
  '└┴┬├─┼╞╟╚╔╩╦╠═╬╧' +
  '╨╤╥╙╘╒╓╫╪┘┌█▄▌▐▀' +
  'αßΓπΣσµτΦΘΩδ∞φε∩' +
  '≡±≥≤⌠⌡÷≈°∙·√ⁿ²■\u00a0';

const UPPER = new Set(CP437_UPPER);

/** One printable character of the report: plain ASCII 0x20-0x7E or the upper half of code page 437. */
function printable(ch: string): boolean {
  const code = ch.codePointAt(0)!;
  return (code >= 0x20 && code <= 0x7e) || UPPER.has(ch);
}

/**
 * Text as the report can print it: composed (NFC) so accents stay one character, control characters
 * (tabs, line breaks inside a label) turned into spaces, anything else code page 437 lacks into "?".
 * Every character of the result takes one column.
 */
export function cp437Text(value: string): string {
  let out = '';
  for (const ch of value.normalize('NFC')) {
    const code = ch.codePointAt(0)!;
    if (code < 0x20 || code === 0x7f || (code >= 0x80 && code < 0xa0)) out += ' ';
    else out += printable(ch) ? ch : '?';
  }
  return out;
}
