/** "14:05" in the server's time zone: the shop's clock for a one-shop install. */
export function clockTime(at: Date): string {
  return new Intl.DateTimeFormat("en-GB", { hour: "2-digit", minute: "2-digit", hour12: false }).format(at);
}

export function staleDraftMessage(editor: string | null, at: Date): string {
  return `${editor ?? "Someone else"} saved this draft at ${clockTime(at)}, after you opened it. Reload to see their changes; your edits stay on screen until you do.`;
}
