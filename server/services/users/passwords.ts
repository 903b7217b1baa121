import fs from 'node:fs';
import bcrypt from 'bcryptjs';
import { ValidationError } from '../../errors.ts';
import { config } from '../../config.ts';

const COST = config.env === 'test' ? 4 : 11;

const commonPasswords = new Set(
  fs
    .readFileSync(new URL('../../data/common-passwords.txt', import.meta.url), 'utf8')
    .split('\n')
    .map((line) => line.trim().toLowerCase())
    .filter((line) => line && !line.startsWith('#')),
);

/** Hashes a password with bcrypt (cost 11 in use, 4 under test for speed). */
export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, COST);
}

/** Compares in constant time; a user with no password (pending invitation) never matches. */
export function verifyPassword(password: string, hash: string | null | undefined): Promise<boolean> {
  return hash ? bcrypt.compare(password, hash) : Promise.resolve(false);
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
