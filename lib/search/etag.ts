export interface IndexVersion {
  count: number;
  maxUpdatedAt: Date | null;
  /** A digest of the catalogue names the index carries (causes, families, parts), which change apart from the write-ups. */
  catalogue: string;
}

/**
 * The index's version: it changes when a write-up is published, edited, unpublished or removed, and
 * when a cause, motor family or part a write-up may name is renamed.
 */
export function indexEtag(version: IndexVersion): string {
  return `"wi-${version.count}-${version.maxUpdatedAt ? version.maxUpdatedAt.getTime() : 0}-${version.catalogue.slice(0, 16)}"`;
}

/** True when an If-None-Match header names `etag` (a list, weak forms and "*" included). */
export function etagMatches(ifNoneMatch: string | null, etag: string): boolean {
  if (!ifNoneMatch) return false;
  const bare = (tag: string) => tag.trim().replace(/^W\//, "");
  return ifNoneMatch.split(",").some((tag) => tag.trim() === "*" || bare(tag) === bare(etag));
}
