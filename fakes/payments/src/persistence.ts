import fs from 'node:fs';
import path from 'node:path';
import type { Completed } from './idempotency.js';
import type { PaymentsRuntime } from './runtime.js';
import type { StoreSnapshot } from './state.js';

interface FileContents {
  store: StoreSnapshot;
  idempotency: Array<[string, Completed]>;
}

/**
 * Keeps the fake's state (sessions, payment intents, charges, refunds,
 * balance transactions, events and answered idempotency keys) in one JSON
 * file, so a restart forgets nothing the shop's database refers to.
 *
 * Each save writes a temporary file beside the real one, flushes it to disk
 * and renames it over the old one: a crash leaves either the old state or
 * the new, never half a file. Saves are coalesced: changes made while one is
 * being written are saved by the next one. Each save writes the whole state,
 * so its cost grows with the state: the pause before the next save is at
 * least SAVE_PAUSE_FACTOR times the last save's duration, which keeps saving
 * to a bounded share of one core (about a fifth) however large the file
 * grows, instead of snapshotting back to back through a busy minute. A crash
 * may forget the changes of that last pause; a clean stop writes them.
 */
/** The pause after a save is at least this many times as long as the save took. */
export const SAVE_PAUSE_FACTOR = 4;

export class StateFile {
  private dirty = false;
  private lastSaveMs = 0;
  private writing: Promise<void> | null = null;
  private timer: NodeJS.Timeout | null = null;
  private closed = false;

  constructor(
    readonly file: string,
    private readonly runtime: PaymentsRuntime,
    private readonly delayMs = 250,
  ) {}

  /** Loads the file if there is one; returns whether anything was restored. A damaged file is refused loudly. */
  load(): boolean {
    if (!fs.existsSync(this.file)) return false;
    const text = fs.readFileSync(this.file, 'utf8');
    let contents: FileContents;
    try {
      contents = JSON.parse(text) as FileContents;
    } catch (error) {
      throw new Error(`the payments fake's state file ${this.file} is not valid JSON (${(error as Error).message}); move it away to start empty`);
    }
    if (contents?.store?.version !== 1) throw new Error(`the payments fake's state file ${this.file} has an unknown format`);
    this.runtime.store.restore(contents.store);
    this.runtime.idempotency.restore(contents.idempotency ?? []);
    return true;
  }

  private contents(): string {
    const contents: FileContents = { store: this.runtime.store.snapshot(), idempotency: this.runtime.idempotency.snapshot() };
    return JSON.stringify(contents);
  }

  /** Something changed: save soon. */
  changed(): void {
    if (this.closed) return;
    this.dirty = true;
    this.schedule();
  }

  private schedule(): void {
    if (this.timer || this.writing || this.closed || !this.dirty) return;
    this.timer = setTimeout(
      () => {
        this.timer = null;
        void this.save();
      },
      Math.max(this.delayMs, SAVE_PAUSE_FACTOR * this.lastSaveMs),
    );
    this.timer.unref();
  }

  private async save(): Promise<void> {
    if (this.writing) return this.writing;
    this.writing = (async () => {
      this.dirty = false;
      const started = performance.now();
      try {
        await writeAtomically(this.file, this.contents());
      } catch (error) {
        console.error(`[payments fake] could not save state to ${this.file}:`, (error as Error).message);
      }
      this.lastSaveMs = performance.now() - started;
    })().finally(() => {
      this.writing = null;
      // changes made while writing: saved after the pause
      this.schedule();
    });
    return this.writing;
  }

  /** Writes what is pending and stops saving. */
  async close(): Promise<void> {
    // closed first, so a save finishing now schedules nothing more
    this.closed = true;
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
    await this.writing;
    if (this.dirty) {
      this.dirty = false;
      await writeAtomically(this.file, this.contents());
    }
  }
}

async function writeAtomically(file: string, text: string): Promise<void> {
  await fs.promises.mkdir(path.dirname(file), { recursive: true });
  const temp = `${file}.${process.pid}.tmp`;
  const handle = await fs.promises.open(temp, 'w', 0o600);
  try {
    await handle.writeFile(text, 'utf8');
    await handle.sync();
  } finally {
    await handle.close();
  }
  await fs.promises.rename(temp, file);
}
