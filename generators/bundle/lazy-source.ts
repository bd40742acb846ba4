/**
 * A one-chunk source that JSZip reads like a Node stream (it only needs on/pause/resume, see jszip's
 * nodejsUtils.isStream) and that makes its bytes only when JSZip resumes it, which with `streamFiles` it
 * does one entry at a time. So a 1,000-station bundle renders each station while it is being zipped and
 * never holds every file at once. Much lighter than a stream.Readable per entry.
 */
type Listener = (arg?: unknown) => void;

export class LazySource {
  private listeners: Record<string, Listener[]> = {};
  private started = false;

  constructor(private produce: (() => Uint8Array) | null) {}

  on(event: string, listener: Listener): this {
    (this.listeners[event] ??= []).push(listener);
    return this;
  }

  pause(): this {
    return this;
  }

  resume(): this {
    if (this.started) return this;
    this.started = true;
    // Emitting inside resume() would re-enter JSZip's worker before it finished resuming; next turn instead
    // (setImmediate, so a server answering other requests gets its turn between entries).
    setImmediate(() => this.emitAll());
    return this;
  }

  private emitAll(): void {
    const produce = this.produce;
    this.produce = null;
    let bytes: Uint8Array;
    try {
      bytes = produce ? produce() : new Uint8Array(0);
    } catch (error) {
      this.emit('error', error);
      return;
    }
    if (bytes.length > 0) this.emit('data', Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength));
    this.emit('end');
    this.listeners = {};
  }

  private emit(event: string, arg?: unknown): void {
    for (const listener of this.listeners[event] ?? []) listener(arg);
  }
}
