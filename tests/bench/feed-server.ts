/**
 * A server for `npm run bench:feed`, in its own process so it does not share a CPU with the load
 * generator: `app` runs Starproof (createApp) on DATABASE_URL; `static <file>` serves one file with
 * express.static, the peer. Prints the bound port as JSON, then serves until killed.
 */
import express from 'express';
import path from 'node:path';

const [mode, file] = process.argv.slice(2);
let app: express.Express;
if (mode === 'static') {
  app = express();
  app.disable('x-powered-by');
  app.use(express.static(path.dirname(path.resolve(file)), { maxAge: 0, dotfiles: 'allow' }));
} else {
  const { createApp } = await import('../../server/app.ts');
  app = createApp();
}
const server = app.listen(0, '127.0.0.1', () => {
  console.log(JSON.stringify({ port: (server.address() as { port: number }).port }));
});
