export interface Segment {
  text: string;
  hit: boolean;
}

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");

function termPattern(terms: string[]): RegExp | null {
  const clean = [...new Set(terms.map((t) => t.trim()).filter(Boolean))].sort((a, b) => b.length - a.length);
  if (clean.length === 0) return null;
  return new RegExp(`(?<![\\p{L}\\p{N}])(?:${clean.map(escape).join("|")})(?![\\p{L}\\p{N}])`, "giu");
}

/** Splits text into plain and matched runs; `terms` are the index's matched words (whole words). */
export function highlightSegments(text: string, terms: string[]): Segment[] {
  const pattern = termPattern(terms);
  if (!pattern) return [{ text, hit: false }];
  const out: Segment[] = [];
  let last = 0;
  for (const match of text.matchAll(pattern)) {
    const at = match.index ?? 0;
    if (at > last) out.push({ text: text.slice(last, at), hit: false });
    out.push({ text: match[0], hit: true });
    last = at + match[0].length;
  }
  if (last < text.length) out.push({ text: text.slice(last), hit: false });
  return out;
}

/** A short stretch of `text` around its first matched word, or null when no word matched. */
export function snippetAround(text: string, terms: string[], radius = 80): string | null {
  const pattern = termPattern(terms);
  const match = pattern ? pattern.exec(text) : null;
  if (!match) return null;
  let start = Math.max(0, match.index - radius);
  let end = Math.min(text.length, match.index + match[0].length + radius);
  if (start > 0) start = text.indexOf(" ", start) + 1 || start;
  if (end < text.length) end = text.lastIndexOf(" ", end) > match.index ? text.lastIndexOf(" ", end) : end;
  return `${start > 0 ? "… " : ""}${text.slice(start, end).trim()}${end < text.length ? " …" : ""}`;
}
