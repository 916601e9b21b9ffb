/** The index's version: it changes when a write-up is published, edited, unpublished or removed. */
export function indexEtag(version: { count: number; maxUpdatedAt: Date | null }): string {
  return `"wi-${version.count}-${version.maxUpdatedAt ? version.maxUpdatedAt.getTime() : 0}"`;
}

/** True when an If-None-Match header names `etag` (a list, weak forms and "*" included). */
export function etagMatches(ifNoneMatch: string | null, etag: string): boolean {
  if (!ifNoneMatch) return false;
  const bare = (tag: string) => tag.trim().replace(/^W\//, "");
  return ifNoneMatch.split(",").some((tag) => tag.trim() === "*" || bare(tag) === bare(etag));
}
