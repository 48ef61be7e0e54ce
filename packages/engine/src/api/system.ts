import { z } from 'zod';
import { Timestamp } from './common';

/**
 * `GET /api/health`: 200 with this body while the database answers; 503 `unavailable` (with
 * Retry-After) while it does not.
 */
export const HealthResponse = z
  .object({
    status: z.literal('ok'),
    version: z.string(),
    db: z.object({ state: z.literal('up'), roundTripMs: z.number() }),
  })
  .meta({ id: 'HealthResponse' });
export type HealthResponse = z.infer<typeof HealthResponse>;

/** One message caught by the development mail inbox. */
export const DevMailMessage = z
  .object({
    id: z.string(),
    to: z.string().meta({ description: "recipients, comma-separated" }),
    from: z.string(),
    subject: z.string(),
    text: z.string(),
    html: z.string(),
    receivedAt: Timestamp,
  })
  .meta({ id: 'DevMailMessage' });
export type DevMailMessage = z.infer<typeof DevMailMessage>;

/** `GET /api/dev/mail` (development and test only), newest first. */
export const DevMailResponse = z.object({ messages: z.array(DevMailMessage) }).meta({ id: 'DevMailResponse' });
export type DevMailResponse = z.infer<typeof DevMailResponse>;
