/**
 * Bulk writes that keep the event loop free: the second connection of the server process.
 *
 * A large import written in one synchronous transaction blocks the event loop for as long as SQLite
 * takes (about 0.7 s for 65,000 aircraft, the most a 16 MiB CSV holds). `BulkWriter` instead runs the
 * import's steps in one BEGIN IMMEDIATE transaction on a connection of its own, yielding to the event
 * loop between steps, and commits once: all or nothing, as before. Meanwhile
 * - reads go on on the main connection and see only committed data (WAL snapshot isolation);
 * - every other write of the process waits in the write gate (db/writeGate.ts) until the import has
 *   committed or rolled back; while the import runs, the main connection's busy timeout is 0, so a
 *   write that slipped past the gate fails at once rather than block the loop in SQLite's busy handler;
 * - the transaction starts with BEGIN IMMEDIATE, retried asynchronously while another process holds
 *   the write lock (up to the busy timeout), so waiting for another process never blocks the loop.
 *
 * The bulk connection is opened by the main thread at start-up and closed only at shutdown, after the
 * main connection's last use; it is a SQLite connection, so its descriptors are managed by SQLite and
 * opening or closing it never drops the process's locks (docs/storage.md, "One owner of the database
 * file"). Worker threads never open the database.
 *
 * On an in-memory database (tests) there is no second connection: the steps run at once in one
 * transaction on the main connection.
 */
import Database from 'better-sqlite3';
import { setImmediate as nextTurn } from 'node:timers/promises';
import { BUSY_TIMEOUT_MS } from './client.js';
import { WriteGate } from './writeGate.js';

/** The longest a bulk import holds the event loop between two yields, ms (a target, not a cap). */
export const BULK_SLICE_MS = 8;
/** Pause between two attempts to take the write lock held by another process, ms. */
const BUSY_RETRY_MS = 20;

export interface BulkWriter {
  /** The gate other writes of the process pass through (shared leases; see db/writeGate.ts). */
  readonly gate: WriteGate;
  /**
   * Runs `steps(connection)` in one BEGIN IMMEDIATE transaction, letting the event loop run between
   * steps (every BULK_SLICE_MS); commits when the generator returns, rolls back when it throws.
   */
  run<T>(steps: (sqlite: Database.Database) => Generator<void, T>): Promise<T>;
  /** Closes the bulk connection (at shutdown; an import still running is rolled back). */
  close(): void;
}

function isBusy(e: unknown): boolean {
  const code = (e as { code?: string }).code;
  return code === 'SQLITE_BUSY' || code === 'SQLITE_LOCKED';
}

/**
 * Opens the bulk connection beside `main` (an open, migrated connection), with the same pragmas but a
 * busy timeout of 0 (waits are asynchronous, see above) and no automatic checkpoint (the checkpoint
 * after a bulk commit runs on a later turn of the loop).
 */
export function openBulkWriter(main: Database.Database): BulkWriter {
  const gate = new WriteGate();
  const conn = main.memory ? undefined : new Database(main.name);
  if (conn) {
    conn.pragma('busy_timeout = 0');
    conn.pragma('synchronous = FULL');
    conn.pragma('foreign_keys = ON');
    conn.pragma('wal_autocheckpoint = 0');
  }
  let closed = false;

  const begin = async (db: Database.Database): Promise<void> => {
    const start = performance.now();
    for (;;) {
      try {
        db.exec('BEGIN IMMEDIATE');
        return;
      } catch (e) {
        if (!isBusy(e) || performance.now() - start > BUSY_TIMEOUT_MS) throw e;
        await new Promise((r) => setTimeout(r, BUSY_RETRY_MS));
      }
    }
  };

  const runOn = async <T>(db: Database.Database, steps: (sqlite: Database.Database) => Generator<void, T>): Promise<T> => {
    const mainTimeout = main.pragma('busy_timeout', { simple: true }) as number;
    main.pragma('busy_timeout = 0');
    try {
      await begin(db);
      try {
        const it = steps(db);
        let slice = performance.now();
        for (;;) {
          const r = it.next();
          if (r.done) {
            db.exec('COMMIT');
            return r.value;
          }
          if (performance.now() - slice >= BULK_SLICE_MS) {
            await nextTurn();
            if (closed) throw new Error('the database was closed during a bulk import; nothing was imported');
            slice = performance.now();
          }
        }
      } catch (e) {
        if (db.open && db.inTransaction) db.exec('ROLLBACK');
        throw e;
      }
    } finally {
      if (main.open) main.pragma(`busy_timeout = ${mainTimeout}`);
    }
  };

  return {
    gate,
    async run(steps) {
      if (closed) throw new Error('the bulk writer is closed');
      if (!conn) {
        // In memory: one synchronous transaction on the main connection (nothing can interleave).
        return main.transaction(() => {
          const it = steps(main);
          for (;;) {
            const r = it.next();
            if (r.done) return r.value;
          }
        }).immediate();
      }
      const out = await gate.exclusive(() => runOn(conn, steps));
      // Copy the import's pages into the database file on a later turn, outside the gate: a passive
      // checkpoint waits for no one, and the next small commit then finds the WAL short.
      await nextTurn();
      if (!closed && conn.open) {
        try {
          conn.pragma('wal_checkpoint(PASSIVE)');
        } catch (e) {
          if (!isBusy(e)) throw e;
        }
      }
      return out;
    },
    close() {
      closed = true;
      if (conn?.open) {
        if (conn.inTransaction) conn.exec('ROLLBACK');
        conn.close();
      }
    },
  };
}
