import { z } from 'zod';

/** What anyone may read about the business running the shop. */
export const shopInfoSchema = z.object({
  name: z.string(),
  /** An image URL for the shop's logo, or null. */
  logoUrl: z.string().nullable(),
});
export type ShopInfo = z.infer<typeof shopInfoSchema>;
