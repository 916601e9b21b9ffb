"use client";
import { useMemo } from "react";
import useSWR from "swr";
import { fetcher } from "@/lib/fetcher";
import type { WriteupIndexPayload } from "@/lib/search/types";
import { WriteupIndex } from "@/lib/search/writeup-index";

/** The SWR key of the index; revalidate it with `mutate(WRITEUP_INDEX_KEY)` after publishing. */
export const WRITEUP_INDEX_KEY = "/api/writeups/index";

/**
 * The published write-ups, fetched once and revalidated with their ETag (the browser answers an
 * unchanged corpus from its cache after a 304), and the search index loaded from the server's copy
 * (loading takes a fraction of the time building it from the documents would).
 */
export function useWriteupIndex() {
  const { data, error, isLoading } = useSWR<WriteupIndexPayload>(WRITEUP_INDEX_KEY, fetcher, {
    revalidateOnFocus: true,
    dedupingInterval: 10_000,
    keepPreviousData: true,
    // Same version, same documents: keep the old object so the index is not rebuilt.
    compare: (a, b) => a?.version === b?.version,
  });
  const index = useMemo(() => (data ? new WriteupIndex(data.docs, data.index) : null), [data]);
  return { index, error: error as Error | undefined, loading: isLoading };
}
