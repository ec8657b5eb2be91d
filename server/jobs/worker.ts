/** Worker-thread side of the job pool: runs one task per message and posts the result or the error. */
import { parentPort } from 'node:worker_threads';
import { runTask, serialiseError, transferList, type TaskName } from './tasks.js';

interface JobMessage { readonly id: number; readonly task: TaskName; readonly input: unknown }

const port = parentPort;
if (port === null) throw new Error('server/jobs/worker.ts must run in a worker thread');
port.on('message', async (m: JobMessage) => {
  try {
    const output = await runTask(m.task, m.input as never);
    port.postMessage({ id: m.id, ok: true, output }, transferList(m.task, output));
  } catch (e) {
    port.postMessage({ id: m.id, ok: false, error: serialiseError(e) });
  }
});
port.postMessage({ ready: true });
