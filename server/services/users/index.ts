/**
 * People: sign-in, passwords, invitations, one-time tokens, accounts and their sessions.
 * The public face of the domain: other domains and routes import from here, never a file inside.
 */
export { checkToken, hashToken, runTokenPurgeJob, TOKEN_PURGE_JOB } from './auth-tokens.ts';
export { hashPassword, verifyPassword, warmPasswordHashing } from './passwords.ts';
export { signIn } from './sign-in.ts';
export { inviteUser, resendInvitation } from './user-invite.ts';
export { updateUser } from './user-update.ts';
export { changePassword, recordSignOut, requestPasswordReset, setPasswordWithToken } from './account-passwords.ts';
