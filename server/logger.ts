import { format } from 'node:util';
import { pino } from 'pino';
import { config } from './config.ts';

/** Properties of driver errors that hold a whole connection object (kilobytes of pool state per line). */
const HEAVY_KEYS = ['client', 'connection', 'original', 'parent', 'sql', 'parameters'];

/**
 * pino's error serializer, minus the driver's connection objects: a PostgreSQL error during an
 * outage becomes one short JSON line with its message, code and stack, not a dump of the pool.
 */
export function serializeError(err: unknown): Record<string, unknown> {
  const out = pino.stdSerializers.err(err as Error) as unknown as Record<string, unknown>;
  for (const key of HEAVY_KEYS) delete out[key];
  const parent = (err as { parent?: { code?: string; message?: string } } | undefined)?.parent;
  if (parent?.code) out.pgCode = parent.code;
  return out;
}

/** Structured JSON logs (one line per event) for the server and request log. */
export const logger = pino({
  level: config.logLevel,
  redact: ['req.headers.cookie', 'req.headers.authorization'],
  serializers: { err: serializeError },
});

/**
 * Sends what libraries print with console.warn / console.error (Sequelize's "Committing
 * transaction failed", pg's notices) through the logger, so the server's output stays one JSON
 * line per event. For the long-running server only; command-line tools keep their console.
 */
export function routeConsoleToLogger(): void {
  const toLine = (args: unknown[]) => {
    const err = args.find((a) => a instanceof Error);
    const text = format(...args.filter((a) => !(a instanceof Error)));
    return err ? [{ err }, text] : [text];
  };
  console.warn = (...args: unknown[]) => logger.warn(...(toLine(args) as [string]));
  console.error = (...args: unknown[]) => logger.error(...(toLine(args) as [string]));
}
