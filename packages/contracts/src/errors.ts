import { z } from 'zod';

/** The one error shape every API route returns. */
export const errorBodySchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    fields: z.record(z.string(), z.array(z.string())).optional(),
  }),
});
export type ErrorBody = z.infer<typeof errorBodySchema>;

export const errorCodes = [
  'BAD_JSON',
  'VALIDATION_FAILED',
  'PAYLOAD_TOO_LARGE',
  'NOT_FOUND',
  'UNAUTHENTICATED',
  'FORBIDDEN',
  'CONFLICT',
  'RATE_LIMITED',
  'QUOTA_EXCEEDED',
  'UNSUPPORTED_MEDIA_TYPE',
  'UNPROCESSABLE_IMAGE',
  'MAIL_UNAVAILABLE',
  'INTERNAL',
] as const;
export type ErrorCode = (typeof errorCodes)[number];
