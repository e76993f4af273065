import { z } from 'zod';

// Kept apart from menu.ts so the bake-day view can use it without an import cycle.

/** One stored size of a photo. */
export const menuPhotoFileSchema = z.object({ width: z.number().int(), height: z.number().int(), url: z.string() });
export type MenuPhotoFile = z.infer<typeof menuPhotoFileSchema>;

/** A menu photo as an <img> needs it: the sizes for srcset, and the shape so the layout keeps its place. */
export const menuPhotoViewSchema = z.object({
  id: z.string(),
  /** Of the largest stored size; the others keep the same shape. */
  width: z.number().int(),
  height: z.number().int(),
  /** A middle size, for browsers without srcset. */
  src: z.string(),
  srcset: z.string(),
  /** Every stored file's URL, smallest first. */
  urls: z.array(z.string()),
  files: z.array(menuPhotoFileSchema),
});
export type MenuPhotoView = z.infer<typeof menuPhotoViewSchema>;
