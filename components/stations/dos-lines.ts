// Lines of decoded DOS text, counted the way the engine counts them (no React, so tests can use it).

/** Splits decoded text into lines as the engine counts them (CR LF, LF or CR each end one line). */
export function splitDosLines(text: string): string[] {
  const cut = text.indexOf('\x1a');
  const body = cut >= 0 ? text.slice(0, cut) : text;
  const lines = body.split(/\r\n|\n|\r/);
  if (lines.length > 1 && lines[lines.length - 1] === '') lines.pop();
  return lines;
}
