/** SHA-256 of file bytes (node:crypto; not imported by the browser). */
import { createHash } from 'node:crypto';

export function sha256Hex(bytes: Uint8Array): string {
  return createHash('sha256').update(bytes).digest('hex');
}
