// On the web the finished zip becomes a blob URL clicked through an <a download>, which the browser saves
// under the server's 8.3 name (and which browser tests see as a download).
export function saveZip(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  a.style.display = 'none';
  document.body.appendChild(a);
  a.click();
  a.remove();
  // The browser has taken the bytes once the click is handled; free them a little later.
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}
