import { Router } from 'express';
import type { OutboxMessageDto } from '@shared/schemas/outbox.ts';
import { config } from '../config.ts';
import { currentUser, requireUser } from '../middlewares/authenticate.ts';
import { OutboxMessage } from '../models/index.ts';
import { authorize } from '../policies/index.ts';

export const outboxRouter = Router();
outboxRouter.use(requireUser);

outboxRouter.get('/', async (req, res) => {
  authorize(currentUser(req), 'outbox', 'read');
  const messages = await OutboxMessage.findAll({ order: [['receivedAt', 'DESC']], limit: 200 });
  const data: OutboxMessageDto[] = messages.map((m) => ({
    id: m.id,
    from: m.fromAddress,
    to: m.toAddresses,
    subject: m.subject,
    text: m.textBody,
    receivedAt: m.receivedAt.toISOString(),
  }));
  res.json({ data, meta: { catcher: !config.smtpUrl } });
});
