import { z } from 'zod';

/** Public URLs of a stored photo's two renditions (see server/modules/photos). */
export const photoUrls = (fileKey: string) => ({
  displayUrl: `/uploads/${fileKey}-display.webp`,
  thumbUrl: `/uploads/${fileKey}-thumb.webp`,
});

export const PHOTO_LIMITS = {
  /** Per file: a full-size phone photo fits with room to spare. */
  maxFileBytes: 15 * 1024 * 1024,
  maxFilesPerUpload: 12,
  maxPerSlab: 12,
  /** Longest side of the rendition shown on the slab page, and of the grid thumbnail. */
  displayPx: 1600,
  thumbPx: 480,
  maxAltText: 300,
} as const;

/** What the file picker offers; the server decides by the file's bytes, not by this list. */
/** Which side of a slab a photo shows; the database CHECK on slab_photos.view lists the same keys. */
export const PHOTO_VIEWS = ['top-face', 'bottom-face', 'end-grain', 'edge', 'defect'] as const;
export type PhotoView = (typeof PHOTO_VIEWS)[number];
export const PHOTO_VIEW_LABELS: Record<PhotoView, string> = {
  'top-face': 'Top face',
  'bottom-face': 'Bottom face',
  'end-grain': 'End grain',
  edge: 'Edge',
  defect: 'Defect close-up',
};

export const PHOTO_ACCEPT = 'image/jpeg,image/png,image/webp,image/heic';
export const PHOTO_FIELD = 'photos';

export const updatePhotoSchema = z
  .object({
    isCover: z.literal(true, { error: 'To change the cover, make another photo the cover' }),
    isIllustration: z.boolean({ error: 'Illustration must be true or false' }),
    altText: z.string().trim().max(PHOTO_LIMITS.maxAltText, `Keep the description under ${PHOTO_LIMITS.maxAltText} characters`),
    view: z.enum(PHOTO_VIEWS, { error: 'Choose what the photo shows from the list' }).nullable(),
  })
  .partial()
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change', path: ['_form'] });
export type UpdatePhotoInput = z.input<typeof updatePhotoSchema>;

export const reorderPhotosSchema = z
  .object({
    photoIds: z.array(z.number().int().positive(), { error: 'photoIds must be a list of photo ids' })
      .min(1, 'List the photos in their new order')
      .max(200)
      .refine((ids) => new Set(ids).size === ids.length, 'A photo is listed twice'),
  })
  .strict();
export type ReorderPhotosInput = z.infer<typeof reorderPhotosSchema>;

export type YardPhotoView = {
  id: number; displayUrl: string; thumbUrl: string; width: number; height: number;
  position: number; isCover: boolean; isIllustration: boolean; altText: string; view: PhotoView | null; createdAt: string;
};

export type YardPhotoList = { slabId: number; items: YardPhotoView[]; maxPerSlab: number };
