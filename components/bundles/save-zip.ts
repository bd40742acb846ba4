// Bootwright ships as a web app; a native build has no file download yet, so it says so plainly.
export function saveZip(_blob: Blob, fileName: string): void {
  throw new Error(`Saving ${fileName} works in the web app only: open Bootwright in a browser to download bundles.`);
}
