// Pure: shared by the Markdown sanitiser (browser and server) and the upload routes.

/** Upload ids are 32 lowercase hex characters (128 random bits). */
export const UPLOAD_ID_PATTERN = /^[a-f0-9]{32}$/;

/** The only image sources a write-up may show: one of our uploads, full size or its thumbnail. */
export const UPLOAD_SRC_PATTERN = /^\/api\/uploads\/[a-f0-9]{32}(?:\/thumb)?$/;

export const uploadUrl = (id: string) => `/api/uploads/${id}`;
export const thumbUrl = (id: string) => `/api/uploads/${id}/thumb`;

/** Upload ids named by image sources in a Markdown text (for linking the photos to what uses them). */
export function uploadIdsIn(markdown: string): string[] {
  const ids = new Set<string>();
  for (const match of markdown.matchAll(/\/api\/uploads\/([a-f0-9]{32})(?![a-f0-9])/g)) ids.add(match[1]);
  return [...ids];
}
