import fs from 'node:fs';
import { config } from '../../config.ts';
import { ValidationError } from '../../errors.ts';
import { runHashJob } from '../../auth/password-pool.ts';

const COST = config.env === 'test' ? 4 : 11;

const commonPasswords = new Set(
  fs
    .readFileSync(new URL('../../data/common-passwords.txt', import.meta.url), 'utf8')
    .split('\n')
    .map((line) => line.trim().toLowerCase())
    .filter((line) => line && !line.startsWith('#')),
);

/** Hashes a password with bcrypt (cost 11 in use, 4 under test for speed), in the worker pool. */
export function hashPassword(password: string): Promise<string> {
  return runHashJob<string>({ op: 'hash', password, cost: COST });
}

let dummyHash: Promise<string> | undefined;
/** A hash of a random secret at the same cost, so "no such account" takes as long as a wrong password. */
function dummy(): Promise<string> {
  dummyHash ??= hashPassword(crypto.randomUUID()).catch((err) => {
    dummyHash = undefined;
    throw err;
  });
  return dummyHash;
}

/**
 * Starts a hashing thread and times one hash at the cost in use, before the server listens: the
 * first burst of sign-ins then neither waits for a thread to start nor is admitted by a guess of
 * how long a hash takes on this machine (password-pool.ts judges waits from measured hashes). The
 * hash made is the dummy one that unknown addresses are compared against.
 */
export async function warmPasswordHashing(): Promise<void> {
  await dummy();
}

/**
 * Compares in constant time, in the worker pool. With no hash (unknown address, pending
 * invitation) a dummy hash is compared all the same, so the answer takes as long, and never matches.
 */
export async function verifyPassword(password: string, hash: string | null | undefined): Promise<boolean> {
  if (!hash) {
    await runHashJob<boolean>({ op: 'compare', password, hash: await dummy() });
    return false;
  }
  return runHashJob<boolean>({ op: 'compare', password, hash });
}

/**
 * Refuses passwords that are common, a single repeated character, or the user's own e-mail.
 * Length is already checked by the shared schema.
 * @throws HttpError 400 with the reason under field `field`
 */
export function assertAcceptablePassword(password: string, email: string, field = 'newPassword'): void {
  const lower = password.toLowerCase();
  const reason = commonPasswords.has(lower)
    ? 'This password is one of the most common ones and is easy to guess. Choose another.'
    : /^(.)\1+$/.test(password)
      ? 'A password of one repeated character is easy to guess. Choose another.'
      : lower === email.toLowerCase() || lower === email.split('@')[0]?.toLowerCase()
        ? 'Do not use your e-mail address as your password.'
        : undefined;
  if (reason) throw ValidationError(`${field}: ${reason}`, { [field]: reason });
}
