import { z } from 'zod';

// One-click unsubscribe (RFC 8058): a signed token in the link, no sign-in needed.

/** Query of GET and POST /api/mail/unsubscribe?token=… */
export const unsubscribeQuerySchema = z.object({
  token: z
    .string()
    .min(10)
    .max(400)
    .regex(/^[A-Za-z0-9_-]+\.[A-Za-z0-9_-]+$/, 'This unsubscribe link is damaged.'),
});

/** GET tells the page what the link is for; POST stops the e-mails at once. */
export const unsubscribeResultSchema = z.object({
  studio: z.object({ slug: z.string(), name: z.string() }),
  /** Whether the studio's e-mails still go to this person. */
  mailOptIn: z.boolean(),
});
export type UnsubscribeResult = z.infer<typeof unsubscribeResultSchema>;
