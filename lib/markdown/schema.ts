import type { Options as Schema } from "rehype-sanitize";
import { UPLOAD_SRC_PATTERN } from "@/lib/storage/urls";

const headings = ["h1", "h2", "h3", "h4", "h5", "h6"] as const;
const align: [string, ...string[]] = ["align", "left", "center", "right"];

/**
 * What a write-up may contain, and nothing else: headings, paragraphs, emphasis, lists (with task
 * boxes), tables, quotes, code, links (web and mail only) and images from our own upload route.
 * Every key is given, so nothing falls back to the sanitiser's more generous default.
 */
export const writeupSchema: Schema = {
  allowComments: false,
  allowDoctypes: false,
  tagNames: [
    ...headings, "p", "br", "hr", "strong", "em", "del", "code", "pre", "blockquote",
    "ul", "ol", "li", "input", "table", "thead", "tbody", "tr", "th", "td", "a", "img",
  ],
  attributes: {
    ...Object.fromEntries(headings.map((h) => [h, ["id"]])),
    a: ["href", "title"],
    img: [["src", UPLOAD_SRC_PATTERN], "alt", "title"],
    code: [["className", /^language-[\w+#-]{1,30}$/]],
    ol: ["start", ["className", "contains-task-list"]],
    ul: [["className", "contains-task-list"]],
    li: [["className", "task-list-item"]],
    input: [["type", "checkbox"], ["disabled", true], "checked"],
    th: [align],
    td: [align],
  },
  required: { input: { type: "checkbox", disabled: true } },
  ancestors: {
    li: ["ol", "ul"],
    input: ["li"],
    thead: ["table"],
    tbody: ["table"],
    tr: ["table"],
    th: ["table"],
    td: ["table"],
  },
  protocols: { href: ["http", "https", "mailto"], src: [] },
  // Heading ids come from their text; the prefix keeps a heading called "location" from clobbering globals.
  clobber: ["id", "name"],
  clobberPrefix: "wu-",
  // Dropped with everything inside them (other unknown elements keep their text).
  strip: ["script", "style", "template", "noscript", "iframe", "frame", "object", "embed", "svg", "math", "textarea", "select", "title"],
};
