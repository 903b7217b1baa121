import { config } from '../config.ts';
import { stopLocalPostgres } from '../db/local-postgres.ts';

// Stops the development cluster cleanly; its data stays for the next `npm start`.
stopLocalPostgres(config.localPostgres.dataDir);
console.log('PostgreSQL stopped.');
