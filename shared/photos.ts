/** Public URLs of a stored photo's two renditions (see server/modules/photos). */
export const photoUrls = (fileKey: string) => ({
  displayUrl: `/uploads/${fileKey}-display.webp`,
  thumbUrl: `/uploads/${fileKey}-thumb.webp`,
});
