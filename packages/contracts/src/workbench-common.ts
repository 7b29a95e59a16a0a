import { z } from 'zod';

// Shared pieces of the workbench contracts: ids, colors, pages, the safety note.

export const idSchema = z.uuid();

export const hexColorSchema = z
  .string()
  .regex(/^#[0-9a-fA-F]{6}$/, 'Use a color like #1f6f78.')
  .transform((hex) => hex.toLowerCase());

export const nameSchema = z.string().trim().min(1).max(80);

/** Query of every list that grows: ?limit=25&offset=0. */
export const pageQuerySchema = z.object({
  limit: z.coerce.number().int().min(1).max(100).default(25),
  offset: z.coerce.number().int().min(0).max(1_000_000).default(0),
});
export type PageQuery = z.infer<typeof pageQuerySchema>;

export const pageSchema = z.object({
  limit: z.number().int(),
  offset: z.number().int(),
  total: z.number().int().nonnegative(),
});
export type Page = z.infer<typeof pageSchema>;

/** `{ items, page }`: the one shape of a paginated list. */
export const pageOf = <T extends z.ZodType>(item: T) =>
  z.object({ items: z.array(item), page: pageSchema });

/** Every response that shows dye amounts carries this: a dye pot is never food. */
export const DYE_SAFETY_NOTE =
  'Dyes, acids and dye powders are for yarn only: these amounts are not food or drink. Keep pots, spoons and measures used for dyeing apart from the kitchen, and follow the dye maker’s safety data sheet.';

/** A dye-kit warning as the API returns it. */
export const warningSchema = z.object({
  code: z.string(),
  severity: z.enum(['info', 'warning', 'critical']),
  message: z.string(),
  lineIndex: z.number().int().optional(),
});
export type Warning = z.infer<typeof warningSchema>;

export const timestampsSchema = z.object({ createdAt: z.string(), updatedAt: z.string() });

/** A PATCH body must change something. */
export const patchOf = <T extends z.ZodRawShape>(fields: T) =>
  z
    .object(fields)
    .partial()
    .refine(
      (patch) => Object.values(patch).some((v) => v !== undefined),
      'Change at least one field.',
    );
