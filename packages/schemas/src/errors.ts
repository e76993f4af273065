import { z } from 'zod';

/** The one error body every API error uses. */
export const errorBodySchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    details: z.unknown().optional(),
  }),
});
export type ErrorBody = z.infer<typeof errorBodySchema>;

/** Field errors travel in `details.fields` as { path: message }. */
export type FieldErrors = Record<string, string>;
