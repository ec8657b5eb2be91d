/**
 * Synchronous transactions. better-sqlite3 is synchronous, and so must a transaction callback be: an
 * async callback would return at its first `await`, the transaction would commit, and the writes after
 * the `await` would run outside it. `transaction` refuses a callback that returns a promise: it throws
 * `AsyncTransactionError`, which rolls back what the callback wrote before its first `await`.
 *
 * Top-level write transactions start with BEGIN IMMEDIATE: the write lock is taken at the start (waiting
 * up to the busy timeout), so a transaction never fails half-way when another process holds the lock.
 * Inside an outer transaction the callback runs in a savepoint: a throw undoes only its own writes,
 * unless the outer callback lets the error propagate, which undoes everything.
 */
import type { Db } from './types.js';

export class AsyncTransactionError extends TypeError {
  override readonly name = 'AsyncTransactionError';
  constructor() {
    super('transaction callbacks must be synchronous: the callback returned a promise, so the transaction was rolled back');
  }
}

export type TransactionBehavior = 'immediate' | 'deferred' | 'exclusive';

function isThenable(v: unknown): v is PromiseLike<unknown> {
  return (typeof v === 'object' || typeof v === 'function') && v !== null && typeof (v as { then?: unknown }).then === 'function';
}

/** Runs `fn` in one transaction (or a savepoint when `db` is already a transaction) and returns its value. */
export function transaction<T>(db: Db, fn: (tx: Db) => T, behavior: TransactionBehavior = 'immediate'): T {
  return db.transaction((tx) => {
    const result = fn(tx);
    if (isThenable(result)) {
      // Keep a rejected promise from surfacing as an unhandled rejection; the caller gets our error.
      Promise.resolve(result).catch(() => undefined);
      throw new AsyncTransactionError();
    }
    return result;
  }, { behavior });
}
