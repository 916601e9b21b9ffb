import "server-only";
import { forbidden, notFound } from "next/navigation";
import { isAppError } from "@/lib/errors";

/** For pages: a typed 404 or 403 from the data layer becomes Next's not-found or forbidden page. */
export async function orPageError<T>(load: () => Promise<T>): Promise<T> {
  try {
    return await load();
  } catch (error) {
    if (isAppError(error) && error.code === "not_found") notFound();
    if (isAppError(error) && error.code === "forbidden") forbidden();
    throw error;
  }
}

/** A positive integer route parameter, or a 404. */
export function idParam(raw: string): number {
  if (!/^\d{1,9}$/.test(raw) || Number(raw) === 0) notFound();
  return Number(raw);
}
