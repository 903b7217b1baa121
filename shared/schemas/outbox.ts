import { z } from 'zod';

export const OutboxMessageDtoSchema = z.object({
  id: z.string(),
  from: z.string(),
  to: z.string(),
  subject: z.string(),
  text: z.string(),
  receivedAt: z.string(),
});
export type OutboxMessageDto = z.infer<typeof OutboxMessageDtoSchema>;
