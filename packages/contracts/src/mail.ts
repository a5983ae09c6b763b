import { z } from 'zod';

/** One message as the local mail fake captured it (GET /api/outbox). */
export interface OutboxMessage {
  id: number;
  to: string;
  subject: string;
  text: string;
  html: string | null;
  messageId: string | null;
  sentAt: string;
}

export const outboxQuerySchema = z.object({
  to: z.string().trim().max(254, 'to is too long').optional(),
});
