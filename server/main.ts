/**
 * Entry point: reads and validates the environment once, opens and migrates the database, seeds the
 * invented demo on the first start of an empty database, starts the worker pool for long computations,
 * and serves on 127.0.0.1 unless HOST says otherwise. Environment: docs/web.md ("Running the server").
 */
import { serve } from '@hono/node-server';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { DatabaseFileError, databaseFileFromEnv, openBulkWriter, openDatabase } from '../db/index.js';
import { seedDemoWithResults } from './seed.js';
import { createApp } from './app.js';
import { readServerConfig, ConfigError } from './config.js';
import { workerJobs } from './jobs/index.js';
import { LoopMonitor } from './web/loop.js';
import { parseStudyDocument } from './studies/index.js';

function fail(message: string): never {
  console.error(message);
  process.exit(2);
}

let config;
let dbFile: string;
try {
  config = readServerConfig(process.env);
  dbFile = databaseFileFromEnv();
} catch (e) {
  if (e instanceof ConfigError || e instanceof DatabaseFileError) fail(e.message);
  throw e;
}

if (config.warning) console.warn(config.warning);

let handle: ReturnType<typeof openDatabase>;
try {
  handle = openDatabase(dbFile); // refuses a file that is not an SQLite database
} catch (e) {
  if (e instanceof DatabaseFileError) fail(e.message);
  throw e;
}
const { db, sqlite } = handle;
const demoFile = fileURLToPath(new URL('../examples/demo-study.json', import.meta.url));
const demo = parseStudyDocument(JSON.parse(readFileSync(demoFile, 'utf8')));
if (!demo.ok) fail(`examples/demo-study.json is not a valid study file: ${demo.problems.map((p) => `${p.path}: ${p.message}`).join('; ')}`);
const seeded = seedDemoWithResults(db, demo.input, new Date());
if (seeded.seeded) console.log(`Seeded the invented demo study (study ${seeded.studyId}) with its results.`);

const jobs = workerJobs();
// The main thread owns the database: this connection and the bulk connection beside it for imports,
// both closed only at shutdown. Worker threads never open it (docs/storage.md).
const bulk = openBulkWriter(sqlite);
const loop = new LoopMonitor();
const app = createApp({ db, bulk, loop, clock: () => new Date(), jobs, ...(config.accessToken ? { accessToken: config.accessToken } : {}) });
const server = serve({ fetch: app.fetch, port: config.port, hostname: config.host }, (info) => {
  console.log(`Runwright listening on http://${config.host}:${info.port}${config.accessToken ? ' (access token required)' : ''}; database ${dbFile}`);
});

let stopping = false;
function stop(): void {
  if (stopping) return;
  stopping = true;
  server.close(() => {
    void jobs.close().finally(() => {
      bulk.close();
      sqlite.close();
      process.exit(0);
    });
  });
  setTimeout(() => process.exit(0), 5000).unref();
}
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
