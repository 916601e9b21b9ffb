import { clockTime } from "@/lib/format";

export function staleDraftMessage(editor: string | null, at: Date): string {
  return `${editor ?? "Someone else"} saved this draft at ${clockTime(at)}, after you opened it. Reload to see their changes; your edits stay on screen until you do.`;
}
