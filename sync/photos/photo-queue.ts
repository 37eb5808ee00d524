import { backoffDelayMs } from '../engine/backoff';
import { type TriggerEnv, wireTriggers } from '../engine/triggers';
import { type PhotoApi } from './photo-api';
import { uploadPhoto } from './photo-uploader';
import type { NewPhoto, PhotoStore, QueuedPhoto } from './types';

/*
 * The upload queue of one club on this device. One upload at a time (a phone in a field has little bandwidth to
 * share), oldest photo first. Runs when a photo is added, when the network comes back, when the person returns to
 * the tab and on a timer; after a failure it waits with exponential backoff and jitter before trying again.
 */

export interface PhotoQueueOptions {
  store: PhotoStore;
  api: PhotoApi;
  clubId: string;
  chunkBytes?: number;
  now?: () => number;
  random?: () => number;
  /** Browser events that start an upload run; omitted in Node tests. */
  triggers?: TriggerEnv;
  /** How often to look again while photos wait (ms). */
  intervalMs?: number;
  setTimer?: (fn: () => void, ms: number) => unknown;
  clearTimer?: (handle: unknown) => void;
}

export interface PhotoQueueStatus {
  waiting: number;
  uploading: boolean;
  /** Why the last attempt failed, in plain words; null after a success. */
  lastError: string | null;
}

export class PhotoQueue {
  private running: Promise<void> | null = null;
  private again = false;
  private failures = 0;
  private retryTimer: unknown = null;
  private intervalTimer: unknown = null;
  private unwire: (() => void) | null = null;
  private listeners = new Set<() => void>();
  private status: PhotoQueueStatus = { waiting: 0, uploading: false, lastError: null };
  private stopped = false;

  constructor(private readonly o: PhotoQueueOptions) {}

  get store(): PhotoStore {
    return this.o.store;
  }
  get api(): PhotoApi {
    return this.o.api;
  }
  get clubId(): string {
    return this.o.clubId;
  }

  private get now() {
    return this.o.now ?? Date.now;
  }
  private setTimer(fn: () => void, ms: number): unknown {
    return (this.o.setTimer ?? ((f, t) => setTimeout(f, t)))(fn, ms);
  }
  private clearTimer(h: unknown): void {
    if (h !== null) (this.o.clearTimer ?? ((x) => clearTimeout(x as ReturnType<typeof setTimeout>)))(h);
  }

  /** Starts listening for the network and the tab, and runs once. */
  start(): void {
    this.stopped = false;
    if (this.o.triggers) {
      this.unwire = wireTriggers(this.o.triggers, { onOnline: () => this.kick(), onOffline: () => undefined, onVisible: () => this.kick() });
    }
    const tick = () => {
      this.kick();
      this.intervalTimer = this.setTimer(tick, this.o.intervalMs ?? 60_000);
    };
    tick();
  }

  stop(): void {
    this.stopped = true;
    this.unwire?.();
    this.unwire = null;
    this.clearTimer(this.retryTimer);
    this.clearTimer(this.intervalTimer);
    this.retryTimer = this.intervalTimer = null;
  }

  /** Keeps the photo on the device and queues it; resolves once it is safely stored locally. */
  async add(photo: NewPhoto): Promise<QueuedPhoto> {
    const entry = await this.o.store.add(photo, this.now());
    await this.refresh();
    this.kick();
    return entry;
  }

  getStatus(): PhotoQueueStatus {
    return this.status;
  }

  subscribe(listener: () => void): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  /** Asks for an upload run now; a run in progress runs once more when it ends. */
  kick(): void {
    if (this.stopped) return;
    if (this.running) {
      this.again = true;
      return;
    }
    this.clearTimer(this.retryTimer);
    this.retryTimer = null;
    this.running = this.drain().finally(() => {
      this.running = null;
      if (this.again) {
        this.again = false;
        this.kick();
      }
    });
  }

  /** Resolves when no run is in progress (tests and shutdown). */
  async idle(): Promise<void> {
    while (this.running) await this.running;
  }

  private async refresh(patch: Partial<PhotoQueueStatus> = {}): Promise<void> {
    this.status = { ...this.status, waiting: await this.o.store.countWaiting(this.o.clubId), ...patch };
    for (const l of this.listeners) l();
  }

  private async drain(): Promise<void> {
    const online = this.o.triggers?.navigator?.onLine;
    if (online === false) return this.refresh({ uploading: false, lastError: 'waiting for a connection' });
    await this.refresh({ uploading: true });
    let retryReason: string | null = null;
    let lastRefusal: string | null = null;
    try {
      for (const photo of await this.o.store.waiting(this.o.clubId)) {
        if (this.stopped) break;
        const outcome = await uploadPhoto(photo, { store: this.o.store, api: this.o.api, clubId: this.o.clubId, chunkBytes: this.o.chunkBytes, now: this.now });
        if (outcome.kind === 'uploaded') {
          await this.refresh();
          continue;
        }
        await this.o.store.recordProgress(this.o.clubId, photo.sha256, { attempts: photo.attempts + 1, lastError: outcome.reason });
        if (outcome.kind === 'retry') {
          retryReason = outcome.reason;
          break; // the network or the server is in trouble: the other photos would fail the same way
        }
        lastRefusal = outcome.reason;
      }
    } catch (err) {
      retryReason = err instanceof Error ? err.message : String(err);
    }
    if (retryReason || lastRefusal) {
      this.failures += 1;
      if (!this.stopped) {
        this.retryTimer = this.setTimer(() => this.kick(), backoffDelayMs(this.failures, this.o.random ?? Math.random));
      }
    } else {
      this.failures = 0;
    }
    await this.refresh({ uploading: false, lastError: retryReason ?? lastRefusal });
  }
}
