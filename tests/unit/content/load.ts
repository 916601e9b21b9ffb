import path from "node:path";
import { loadContent, type Content } from "@/db/seed/content";

export const contentDir = path.resolve(__dirname, "../../../content");

let cached: Content | undefined;
/** The demo content, parsed once per test file. */
export function content(): Content {
  cached ??= loadContent(contentDir);
  return cached;
}
