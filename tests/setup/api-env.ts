import { inject } from 'vitest';

// Before any server module is imported: point them at the test database.
process.env.NODE_ENV = 'test';
process.env.DATABASE_URL = inject('databaseUrl');
process.env.STARPROOF_SIGNIN_LIMIT ??= '1000';
