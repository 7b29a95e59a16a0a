import { z } from 'zod';
import { submissionSchema, submissionStatusSchema } from './submissions.ts';
import { idSchema, pageOf, pageQuerySchema } from './workbench-common.ts';

// Moderators' and the host's review of shared skeins: the queue, decisions (one or many), and
// the audit of who decided what and when.

/** Reasons a moderator picks with one key; the sharer reads them as written. */
export const REVIEW_REASON_TEMPLATES = [
  {
    id: 'yarnHidden',
    text: 'We could not see the yarn well. Please mark the yarn area or crop closer.',
  },
  {
    id: 'lighting',
    text: 'The colors look off in this light. A photo in daylight, without flash, would show them truly.',
  },
  { id: 'blurry', text: 'The photo is a little blurry. Please share a sharper one.' },
  { id: 'notYarn', text: 'This photo does not seem to show a skein from this dye-along.' },
  {
    id: 'personalDetails',
    text: 'The photo shows personal details (faces, addresses). Please crop them out.',
  },
] as const;
export type ReasonTemplateId = (typeof REVIEW_REASON_TEMPLATES)[number]['id'];
const templateIds = REVIEW_REASON_TEMPLATES.map((t) => t.id) as [
  ReasonTemplateId,
  ...ReasonTemplateId[],
];

export const reviewActions = ['approve', 'needsChanges', 'reject', 'feature', 'unfeature'] as const;
export const reviewActionSchema = z.enum(reviewActions);
export type ReviewAction = z.infer<typeof reviewActionSchema>;

const reasonFields = {
  reason: z.string().trim().min(3).max(500).optional(),
  reasonTemplate: z.enum(templateIds).optional(),
};

/** needs-changes and reject need a reason: a template or the moderator's own words. */
const decisionFields = z
  .object({ decision: reviewActionSchema, ...reasonFields })
  .refine((d) => !(d.reason && d.reasonTemplate), {
    message: 'Give a typed reason or a template, not both.',
    path: ['reason'],
  })
  .refine((d) => !['needsChanges', 'reject'].includes(d.decision) || d.reason || d.reasonTemplate, {
    message: 'Say why, so the sharer knows what to do.',
    path: ['reason'],
  });

/** POST /api/studios/:slug/review/submissions/:submissionId/decisions */
export const reviewDecisionSchema = decisionFields;
export type ReviewDecision = z.input<typeof reviewDecisionSchema>;

/** POST /api/studios/:slug/review/decisions: the same decision for several skeins. */
export const bulkDecisionSchema = z
  .object({
    submissionIds: z
      .array(idSchema)
      .min(1)
      .max(50)
      .refine((ids) => new Set(ids).size === ids.length, 'List each skein once.'),
    decision: reviewActionSchema,
    ...reasonFields,
  })
  .superRefine((d, ctx) => {
    const checked = decisionFields.safeParse({
      decision: d.decision,
      reason: d.reason,
      reasonTemplate: d.reasonTemplate,
    });
    for (const issue of checked.error?.issues ?? []) {
      ctx.addIssue({ code: 'custom', message: issue.message, path: issue.path });
    }
  });
export type BulkDecision = z.input<typeof bulkDecisionSchema>;

/** Each skein of a bulk decision is checked on its own; one refusal does not stop the rest. */
export const bulkResultSchema = z.object({
  results: z.array(
    z.discriminatedUnion('ok', [
      z.object({ submissionId: idSchema, ok: z.literal(true), status: submissionStatusSchema }),
      z.object({
        submissionId: idSchema,
        ok: z.literal(false),
        error: z.object({ code: z.string(), message: z.string() }),
      }),
    ]),
  ),
});
export type BulkResult = z.infer<typeof bulkResultSchema>;

/** GET /api/studios/:slug/review/submissions: oldest waiting first. */
export const reviewQueueQuerySchema = pageQuerySchema.extend({
  dyeAlongId: idSchema.optional(),
  status: submissionStatusSchema.default('waiting'),
});

export const reviewSubmissionSchema = submissionSchema.extend({
  sharer: z.object({ name: z.string() }),
});
export type ReviewSubmission = z.infer<typeof reviewSubmissionSchema>;
export const reviewQueueSchema = pageOf(reviewSubmissionSchema);
export type ReviewQueue = z.infer<typeof reviewQueueSchema>;

/** GET /api/studios/:slug/review/audit: newest first. */
export const auditQuerySchema = pageQuerySchema.extend({
  dyeAlongId: idSchema.optional(),
  submissionId: idSchema.optional(),
});

export const auditEntrySchema = z.object({
  id: idSchema,
  submissionId: idSchema,
  dyeAlongId: idSchema,
  action: reviewActionSchema,
  fromStatus: submissionStatusSchema,
  toStatus: submissionStatusSchema,
  reason: z.string().nullable(),
  /** Null once the person's account is gone. */
  actor: z.object({ userId: z.string(), name: z.string() }).nullable(),
  /** The skein decided on, by its maker and base; null once it was withdrawn. */
  skein: z.object({ makerName: z.string().nullable(), baseName: z.string() }).nullable(),
  createdAt: z.string(),
});
export type AuditEntry = z.infer<typeof auditEntrySchema>;
export const auditListSchema = pageOf(auditEntrySchema);
export type AuditList = z.infer<typeof auditListSchema>;

/** GET and POST /api/mail/review-unsubscribe?token=… (the token from the e-mail's footer). */
export const reviewMailUnsubscribeResultSchema = z.object({
  studio: z.object({ slug: z.string(), name: z.string() }),
  /** Whether review e-mails (approved, sent back, featured) still go to this person. */
  reviewMails: z.boolean(),
});
export type ReviewMailUnsubscribeResult = z.infer<typeof reviewMailUnsubscribeResultSchema>;

/** Pages of the viewer app that review e-mails link to. */
export const reviewMailPaths = {
  mySkeins: (slug: string) => `/s/${slug}/my-skeins`,
  unsubscribe: (token: string) => `/unsubscribe/review-mails?token=${encodeURIComponent(token)}`,
};
