import { sql } from 'drizzle-orm';
import { boolean, check, index, integer, pgTable, serial, text, timestamp } from 'drizzle-orm/pg-core';
import { within } from './checks';
import { slabs } from './slabs';

export const slabPhotos = pgTable('slab_photos', {
  id: serial('id').primaryKey(),
  slabId: integer('slab_id').notNull().references(() => slabs.id, { onDelete: 'cascade' }),
  /** Random, server-chosen base name; files are <key>-display.webp and <key>-thumb.webp. */
  fileKey: text('file_key').notNull().unique(),
  width: integer('width').notNull(),
  height: integer('height').notNull(),
  position: integer('position').notNull().default(0),
  isCover: boolean('is_cover').notNull().default(false),
  isIllustration: boolean('is_illustration').notNull().default(false),
  altText: text('alt_text').notNull().default(''),
  /** Which side of the slab the photo shows (see PHOTO_VIEWS in shared/photos.ts); null = not said. */
  view: text('view'),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
}, (t) => [
  index('slab_photos_slab_idx').on(t.slabId),
  check('slab_photos_width_in_range', within(t.width, 0, 100_000)),
  check('slab_photos_height_in_range', within(t.height, 0, 100_000)),
  check('slab_photos_position_in_range', within(t.position, 0, 10_000, { minInclusive: true })),
  check('slab_photos_view_known', sql`${t.view} is null or ${t.view} in ('top-face', 'bottom-face', 'end-grain', 'edge', 'defect')`),
]);
