import { pino } from 'pino';
import { config } from './config.ts';

/** Structured JSON logs (one line per event) for the server and request log. */
export const logger = pino({ level: config.logLevel, redact: ['req.headers.cookie', 'req.headers.authorization'] });
