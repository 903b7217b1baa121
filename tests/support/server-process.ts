import { spawn, type ChildProcess } from 'node:child_process';
import net from 'node:net';

/** A port nobody listens on right now. */
export const freePort = () =>
  new Promise<number>((resolve, reject) => {
    const srv = net.createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
  });

/** A Starproof server running as `npm start` runs it, in its own process. */
export interface ServerProcess {
  child: ChildProcess;
  baseUrl: string;
  /** Everything it wrote to standard output and error so far. */
  output: () => string;
}

/**
 * Starts `server/cli/start.ts` on a free port against an existing database and waits for its
 * "ready" line (the start-up sweep has run by then).
 * @param env DATABASE_URL, UPLOADS_DIR and anything else; NODE_ENV, PORT, HOST and the mail port are set here
 * @param options.port the port to listen on (default: a free one)
 * @param options.timeoutMs how long to wait for "ready" before killing it (default 60 s, or
 *   STARPROOF_E2E_START_TIMEOUT_MS on a machine shared by several test runs)
 * @param options.onSpawn told of the process at once, so a caller can stop it even if it never gets ready
 */
export async function startServerProcess(
  env: Record<string, string>,
  {
    port = 0,
    timeoutMs = Number(process.env.STARPROOF_E2E_START_TIMEOUT_MS) || 60_000,
    onSpawn,
  }: { port?: number; timeoutMs?: number; onSpawn?: (child: ChildProcess) => void } = {},
): Promise<ServerProcess> {
  port ||= await freePort();
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/cli/start.ts'], {
    env: {
      ...process.env,
      NODE_ENV: 'test',
      PORT: String(port),
      HOST: '127.0.0.1',
      STARPROOF_SMTP_PORT: '0',
      LOG_LEVEL: process.env.STARPROOF_E2E_LOG_LEVEL ?? 'warn',
      ...env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  onSpawn?.(child);
  let output = '';
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => {
      child.kill('SIGKILL');
      reject(new Error(`server did not start within ${timeoutMs / 1000} s:\n${output}`));
    }, timeoutMs);
    const onData = (chunk: Buffer) => {
      output += chunk.toString();
      if (output.includes('Starproof is ready')) {
        clearTimeout(timer);
        resolve();
      }
    };
    child.stdout!.on('data', onData);
    child.stderr!.on('data', onData);
    child.once('exit', (code) => reject(new Error(`server exited (${code}):\n${output}`)));
  });
  return { child, baseUrl: `http://127.0.0.1:${port}`, output: () => output };
}

/** Stops a server process with a signal and waits until it has gone. */
export async function stopServerProcess(server: ServerProcess, signal: NodeJS.Signals = 'SIGTERM'): Promise<void> {
  if (server.child.exitCode !== null || server.child.signalCode !== null) return;
  const exited = new Promise((r) => server.child.once('exit', r));
  server.child.kill(signal);
  await exited;
}
