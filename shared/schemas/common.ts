import { z } from 'zod';

/** The one error shape every API failure uses. */
export const ApiErrorSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    fields: z.record(z.string(), z.string()).optional(),
    /** What the server holds now, when the answer is a conflict with it (a page saved by someone else). */
    current: z.unknown().optional(),
  }),
});
export type ApiError = z.infer<typeof ApiErrorSchema>;

/** A UUID in a URL or body. */
export const IdSchema = z.uuid({ message: 'must be a valid id' });
