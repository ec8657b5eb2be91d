/**
 * The server's write gate: an asynchronous readers–writer lock over "may write to the database".
 *
 * Every request that may write holds a shared lease for its whole run (`shared`); a bulk import holds
 * the exclusive lease while its transaction is open across turns of the event loop (`exclusive`). So a
 * write never reaches SQLite while the bulk import's transaction holds the file's write lock: it waits
 * here, asynchronously, instead of blocking the event loop in SQLite's busy handler (which could not
 * end, since the import can only finish when the loop runs). Reads need no lease: in WAL mode they
 * never wait, and see the last committed state.
 *
 * A request that itself holds a shared lease and asks for the exclusive one (the import route) gives
 * its shared lease up while it waits and takes it back afterwards, found through its async context
 * (AsyncLocalStorage), so two such requests never wait for each other. Exclusive waiters go first:
 * new shared leases wait behind them, so an import is not starved by a stream of small writes.
 */
import { AsyncLocalStorage } from 'node:async_hooks';

interface Lease { held: boolean }

export class WriteGate {
  private sharedCount = 0;
  private exclusiveHeld = false;
  private readonly sharedWaiters: (() => void)[] = [];
  private readonly exclusiveWaiters: (() => void)[] = [];
  private readonly context = new AsyncLocalStorage<Lease>();

  /** Leases held now (for tests and diagnostics). */
  get state(): { readonly shared: number; readonly exclusive: boolean; readonly waiting: number } {
    return { shared: this.sharedCount, exclusive: this.exclusiveHeld, waiting: this.sharedWaiters.length + this.exclusiveWaiters.length };
  }

  /** Runs `fn` holding a shared lease (taken when no exclusive lease is held or waiting). */
  async shared<T>(fn: () => Promise<T> | T): Promise<T> {
    await this.takeShared();
    const lease: Lease = { held: true };
    try {
      return await this.context.run(lease, fn);
    } finally {
      if (lease.held) {
        lease.held = false;
        this.dropShared();
      }
    }
  }

  /** Runs `fn` holding the exclusive lease: no shared lease is held meanwhile, by anyone else. */
  async exclusive<T>(fn: () => Promise<T> | T): Promise<T> {
    const own = this.context.getStore();
    const suspended = own?.held === true;
    if (suspended) {
      own.held = false;
      this.dropShared();
    }
    await this.takeExclusive();
    try {
      return await fn();
    } finally {
      this.exclusiveHeld = false;
      this.wake();
      if (suspended) {
        await this.takeShared();
        own.held = true;
      }
    }
  }

  private takeShared(): Promise<void> {
    if (!this.exclusiveHeld && this.exclusiveWaiters.length === 0) {
      this.sharedCount++;
      return Promise.resolve();
    }
    return new Promise((res) => this.sharedWaiters.push(() => { this.sharedCount++; res(); }));
  }

  private dropShared(): void {
    this.sharedCount--;
    this.wake();
  }

  private takeExclusive(): Promise<void> {
    if (!this.exclusiveHeld && this.sharedCount === 0 && this.exclusiveWaiters.length === 0) {
      this.exclusiveHeld = true;
      return Promise.resolve();
    }
    return new Promise((res) => this.exclusiveWaiters.push(() => { this.exclusiveHeld = true; res(); }));
  }

  private wake(): void {
    if (this.exclusiveHeld) return;
    if (this.exclusiveWaiters.length > 0) {
      if (this.sharedCount === 0) this.exclusiveWaiters.shift()!();
      return;
    }
    while (this.sharedWaiters.length > 0) this.sharedWaiters.shift()!();
  }
}
