import { z } from 'zod';
import { ROLES } from '../roles.ts';
import { UserLimits } from '../validations.ts';
import { EmailSchema } from './auth.ts';

export const RoleSchema = z.enum(ROLES, { message: `Role must be one of ${ROLES.join(', ')}` });

const name = z
  .string({ message: 'Enter a name' })
  .trim()
  .min(1, 'Enter a name')
  .max(UserLimits.nameMax, `Names are at most ${UserLimits.nameMax} characters`);

export const UserInviteSchema = z.object({ email: EmailSchema, name, role: RoleSchema });
export type UserInviteInput = z.infer<typeof UserInviteSchema>;

export const UserUpdateSchema = z
  .object({ name: name.optional(), role: RoleSchema.optional(), active: z.boolean().optional() })
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change' });
export type UserUpdateInput = z.infer<typeof UserUpdateSchema>;

/** A user as the API shows it, with what the viewer may do to it. */
export const UserDtoSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  role: RoleSchema,
  active: z.boolean(),
  invitationPending: z.boolean(),
  lastSignInAt: z.string().nullable(),
  createdAt: z.string(),
  can: z.object({ update: z.boolean(), deactivate: z.boolean() }),
});
export type UserDto = z.infer<typeof UserDtoSchema>;

/** The signed-in user, as the client's auth context holds it. */
export const SessionUserSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  role: RoleSchema,
});
export type SessionUser = z.infer<typeof SessionUserSchema>;
