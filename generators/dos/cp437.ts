/**
 * Code page 437 text (REFERENCES 5.6: the United States character set, DOS's default) over iconv-lite.
 * One byte is one character both ways, so offsets in decoded text are byte offsets in the file.
 */
import iconv from 'iconv-lite';

/** Decodes DOS bytes to text, one character per byte (control bytes stay control characters). */
export function decodeCp437(bytes: Uint8Array): string {
  const buffer = Buffer.isBuffer(bytes) ? bytes : Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  return iconv.decode(buffer, 'cp437');
}

/** Encodes text back to DOS bytes; characters outside code page 437 become "?" (iconv-lite's default). */
export function encodeCp437(text: string): Uint8Array {
  return iconv.encode(text, 'cp437');
}

/** True when every character of `text` has a code page 437 byte (so encoding loses nothing). */
export function isCp437Text(text: string): boolean {
  return decodeCp437(encodeCp437(text)) === text;
}
