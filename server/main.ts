/** Entry point: reads and validates the environment once, builds the app and serves it. */
import { serve } from '@hono/node-server';
import { createApp } from './app.js';

const port = Number(process.env.PORT ?? 3000);
if (!Number.isInteger(port) || port < 0 || port > 65535) {
  console.error(`PORT: ${process.env.PORT} is not allowed; expected a whole number from 0 to 65535`);
  process.exit(2);
}
const hostname = process.env.HOST ?? '127.0.0.1';
const app = createApp({ clock: () => new Date() });
serve({ fetch: app.fetch, port, hostname }, (info) => {
  console.log(`Runwright listening on http://${hostname}:${info.port}`);
});
