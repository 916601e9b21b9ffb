import { UPLOAD_SRC_PATTERN } from "@/lib/storage/urls";

/** What the sanitised HTML may contain: the write-up schema, plus what the finishing step adds. */
const ALLOWED: Record<string, string[]> = {
  h1: ["id"], h2: ["id"], h3: ["id"], h4: ["id"], h5: ["id"], h6: ["id"],
  p: [], br: [], hr: [], strong: [], em: [], del: [], pre: [], blockquote: [],
  code: ["class"], ul: ["class"], ol: ["start", "class"], li: ["class"],
  input: ["type", "disabled", "checked"],
  table: [], thead: [], tbody: [], tr: [], th: ["align"], td: ["align"],
  a: ["href", "title", "rel", "class", "aria-label"],
  img: ["src", "alt", "title", "loading", "decoding"],
};

/** A browser reads a scheme before the first "/", "?" or "#", after dropping leading blanks and controls. */
function safeHref(value: string): boolean {
  const scheme = /^([^/?#]*):/.exec(value.replace(/^[\u0000-\u0020]+/, ""));
  if (scheme) return /^(https?|mailto)$/i.test(scheme[1]);
  return !value.startsWith("//");
}

/**
 * Every problem with a piece of sanitised HTML: a tag or attribute outside the allow-list, an
 * event handler or style, a link that is not web, mail or relative, an image not from our route.
 * rehype-stringify always quotes attributes and escapes "<" in text, so a tag scan is exact.
 */
export function unsafeParts(html: string): string[] {
  const problems: string[] = [];
  for (const tag of html.matchAll(/<\/?([a-zA-Z][\w:-]*)([^>]*)>/g)) {
    const name = tag[1].toLowerCase();
    const allowed = ALLOWED[name];
    if (!allowed) {
      problems.push(`tag <${name}>`);
      continue;
    }
    for (const attr of tag[2].matchAll(/\s([^\s=]+)(?:="([^"]*)")?/g)) {
      const key = attr[1].toLowerCase();
      const value = (attr[2] ?? "").replace(/&#x([0-9a-f]+);/gi, (_m, h: string) => String.fromCodePoint(parseInt(h, 16))).replace(/&amp;/g, "&");
      if (!allowed.includes(key)) problems.push(`attribute ${key} on <${name}>`);
      if (key === "href" && !safeHref(value)) problems.push(`href ${value}`);
      if (key === "src" && !UPLOAD_SRC_PATTERN.test(value)) problems.push(`src ${value}`);
    }
  }
  if (/<(script|style|iframe|svg|object|embed|math|base|meta|link|form)\b/i.test(html)) problems.push("dangerous element");
  return problems;
}
