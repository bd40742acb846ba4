// Small formatters for the bundle screen.

/** 1,234,567 bytes → "1.2 MB"; under 10 KB in bytes. */
export function formatSize(bytes: number | null): string {
  if (bytes === null) return '–';
  if (bytes < 10_240) return `${bytes.toLocaleString('en-US')} bytes`;
  if (bytes < 1_048_576) return `${(bytes / 1024).toFixed(0)} KB`;
  return `${(bytes / 1_048_576).toFixed(1)} MB`;
}

/** An ISO time as "2026-03-10 14:30 UTC" (the time the zip and its sheets print). */
export function formatUtc(iso: string): string {
  return `${iso.slice(0, 16).replace('T', ' ')} UTC`;
}

export const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
