import type { RunHeader } from '../run/index.ts';
import type { KeyValueStore, StoreKey } from './keyValueStore.ts';

/**
 * Journals a run to the phone's storage while it goes on, so a killed tab, a crash or a flat
 * battery loses at most the readings since the last flush (the app flushes every second).
 *
 * Layout: one small manifest per run plus readings in chunks of `chunkSize`, one key each.
 * Only the open chunk and the manifest are rewritten on a flush, so the cost of a flush stays
 * bounded however long the run (one ever-growing value would make it quadratic).
 */
export const activeRunKey: StoreKey = ['active-run'];
export const manifestKey = (runId: string): StoreKey => ['run', runId, 'manifest'];
export const chunkKey = (runId: string, seq: number): StoreKey => ['run', runId, 'chunk', seq];

export interface JournalManifest {
  header: RunHeader;
  chunkCount: number;
  readingCount: number;
  /** Saved state of the live machinery (detector, alarms), restored on reopen. */
  liveState: Record<string, unknown>;
  /** Wall-clock time of the last successful flush. Units: ms since 1970 */
  savedAtMs: number;
}

interface StoredChunk {
  time_s: Float64Array;
  head_c: Float64Array;
}

export interface RestoredRun {
  journal: RunJournal;
  manifest: JournalManifest;
  timeS: Float64Array;
  headC: Float64Array;
}

export class RunJournal {
  readonly runId: string;
  readonly #store: KeyValueStore;
  readonly #chunkSize: number;
  #header: RunHeader;
  #liveState: Record<string, unknown> = {};
  #isManifestDirty = true;
  /** Sealed chunks not yet written, oldest first. */
  #sealed: { seq: number; chunk: StoredChunk }[] = [];
  #openSeq = 0;
  #openTime: Float64Array;
  #openHead: Float64Array;
  #openLength = 0;
  #isOpenDirty = false;
  #readingCount = 0;
  #flushing: Promise<void> | null = null;

  private constructor(store: KeyValueStore, header: RunHeader, chunkSize: number) {
    if (!(chunkSize >= 1)) throw new RangeError('chunk size must be >= 1');
    this.#store = store;
    this.#header = header;
    this.runId = header.id;
    this.#chunkSize = chunkSize;
    this.#openTime = new Float64Array(chunkSize);
    this.#openHead = new Float64Array(chunkSize);
  }

  /** Starts journalling a new run and marks it as the active one. */
  static async start(store: KeyValueStore, header: RunHeader, nowMs: number, chunkSize = 512): Promise<RunJournal> {
    const journal = new RunJournal(store, header, chunkSize);
    await store.setMany([
      [manifestKey(header.id), journal.#manifest(nowMs)],
      [activeRunKey, header.id],
    ]);
    journal.#isManifestDirty = false;
    return journal;
  }

  /** The kind of source of the run that was going when the app last stopped, or null: read before reopening it. */
  static async activeSourceKind(store: KeyValueStore): Promise<string | null> {
    const runId = await store.get<string>(activeRunKey);
    if (!runId) return null;
    const manifest = await store.get<JournalManifest>(manifestKey(runId));
    return manifest?.header.source.kind ?? null;
  }

  /** Reopens the active run, if one was going when the app last stopped. */
  static async restoreActive(store: KeyValueStore, chunkSize = 512): Promise<RestoredRun | null> {
    const runId = await store.get<string>(activeRunKey);
    if (!runId) return null;
    const loaded = await loadRun(store, runId);
    if (!loaded) return null;
    const { manifest, timeS, headC } = loaded;
    const journal = new RunJournal(store, manifest.header, chunkSize);
    journal.#liveState = manifest.liveState ?? {};
    journal.#readingCount = timeS.length;
    // New readings go into a fresh chunk after the last one stored; the stored ones stay as they are.
    journal.#openSeq = manifest.chunkCount;
    journal.#isManifestDirty = false;
    return { journal, manifest, timeS, headC };
  }

  get header(): RunHeader {
    return this.#header;
  }

  get readingCount(): number {
    return this.#readingCount;
  }

  /** Readings waiting for the next flush. */
  get unsavedCount(): number {
    let n = this.#isOpenDirty ? this.#openLength : 0;
    for (const s of this.#sealed) n += s.chunk.time_s.length;
    return n;
  }

  append(timeS: number, headC: number): void {
    this.#openTime[this.#openLength] = timeS;
    this.#openHead[this.#openLength] = headC;
    this.#openLength += 1;
    this.#readingCount += 1;
    this.#isOpenDirty = true;
    if (this.#openLength === this.#chunkSize) {
      this.#sealed.push({ seq: this.#openSeq, chunk: this.#copyOpen() });
      this.#openSeq += 1;
      this.#openLength = 0;
      this.#isOpenDirty = false;
      this.#isManifestDirty = true;
    }
  }

  updateHeader(header: RunHeader): void {
    if (header.id !== this.runId) throw new RangeError('a journal keeps one run');
    this.#header = header;
    this.#isManifestDirty = true;
  }

  setLiveState(name: string, state: unknown): void {
    this.#liveState = { ...this.#liveState, [name]: state };
    this.#isManifestDirty = true;
  }

  /**
   * Writes what is new in one transaction. On failure nothing is dropped: the same readings
   * are written by the next flush. Concurrent calls share one write.
   */
  flush(nowMs: number): Promise<void> {
    if (this.#flushing) return this.#flushing;
    if (!this.#isManifestDirty && !this.#isOpenDirty && this.#sealed.length === 0) return Promise.resolve();
    const sealed = this.#sealed;
    const entries: [StoreKey, unknown][] = sealed.map(({ seq, chunk }) => [chunkKey(this.runId, seq), chunk]);
    const hasOpen = this.#openLength > 0 && this.#isOpenDirty;
    if (hasOpen) entries.push([chunkKey(this.runId, this.#openSeq), this.#copyOpen()]);
    const openLengthWritten = this.#openLength;
    entries.push([manifestKey(this.runId), this.#manifest(nowMs)]);
    this.#sealed = [];
    this.#isManifestDirty = false;
    const wasOpenDirty = this.#isOpenDirty;
    this.#isOpenDirty = false;
    this.#flushing = this.#store.setMany(entries).then(
      () => {
        this.#flushing = null;
        // Readings appended during the write leave the open chunk dirty again.
        if (this.#openLength !== openLengthWritten) this.#isOpenDirty = true;
      },
      (error: unknown) => {
        this.#flushing = null;
        this.#sealed = [...sealed, ...this.#sealed];
        this.#isManifestDirty = true;
        this.#isOpenDirty = this.#isOpenDirty || wasOpenDirty;
        throw error;
      },
    );
    return this.#flushing;
  }

  /** Flushes and clears the active-run mark: the run is finished and stays as a record. */
  async finish(header: RunHeader, nowMs: number): Promise<void> {
    this.updateHeader(header);
    if (this.#flushing) await this.#flushing.catch(() => undefined);
    await this.flush(nowMs);
    await this.#store.delMany([activeRunKey]);
  }

  #copyOpen(): StoredChunk {
    // slice, not subarray: a structured clone of a view copies the whole underlying buffer.
    return { time_s: this.#openTime.slice(0, this.#openLength), head_c: this.#openHead.slice(0, this.#openLength) };
  }

  #manifest(nowMs: number): JournalManifest {
    return {
      header: this.#header,
      chunkCount: this.#openSeq + (this.#openLength > 0 ? 1 : 0),
      readingCount: this.#readingCount,
      liveState: this.#liveState,
      savedAtMs: nowMs,
    };
  }
}

/** Loads a finished or active run's header and readings by id. */
export async function loadRun(store: KeyValueStore, runId: string): Promise<{ manifest: JournalManifest; timeS: Float64Array; headC: Float64Array } | null> {
  const manifest = await store.get<JournalManifest>(manifestKey(runId));
  if (!manifest) return null;
  const chunks = await store.getMany<StoredChunk>(Array.from({ length: manifest.chunkCount }, (_, i) => chunkKey(runId, i)));
  // A chunk lost to a failed write leaves a hole; the readings around it stand.
  const present = chunks.filter((c): c is StoredChunk => c !== undefined);
  const total = present.reduce((n, c) => n + c.time_s.length, 0);
  const timeS = new Float64Array(total);
  const headC = new Float64Array(total);
  let at = 0;
  for (const c of present) {
    timeS.set(c.time_s, at);
    headC.set(c.head_c, at);
    at += c.time_s.length;
  }
  return { manifest, timeS, headC };
}
