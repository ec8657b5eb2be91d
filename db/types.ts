/**
 * The database type the repositories take: a drizzle SQLite database over better-sqlite3, or a
 * transaction on one (both are synchronous). Repositories compose inside an outer transaction.
 */
import type { RunResult } from 'better-sqlite3';
import type { BaseSQLiteDatabase } from 'drizzle-orm/sqlite-core';
import type * as schema from './schema.js';

export type Db = BaseSQLiteDatabase<'sync', RunResult, typeof schema>;
