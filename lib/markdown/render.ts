// Pure JavaScript, no Node APIs: the article page renders with it on the server and the editor's
// preview with it in the browser, so both show exactly the same HTML.
import rehypeSanitize from "rehype-sanitize";
import rehypeSlug from "rehype-slug";
import rehypeStringify from "rehype-stringify";
import remarkGfm from "remark-gfm";
import remarkParse from "remark-parse";
import remarkRehype from "remark-rehype";
import { unified } from "unified";
import { rehypeWriteupFinish, type TocEntry } from "./plugins";
import { writeupSchema } from "./schema";

export type { TocEntry };

// Raw HTML in the Markdown is never passed on (remark-rehype drops it); the sanitiser then
// enforces the schema on everything Markdown itself can produce.
const processor = unified()
  .use(remarkParse)
  .use(remarkGfm)
  .use(remarkRehype)
  .use(rehypeSlug)
  .use(rehypeSanitize, writeupSchema)
  .use(rehypeWriteupFinish)
  .use(rehypeStringify)
  .freeze();

export interface RenderedMarkdown {
  html: string;
  toc: TocEntry[];
}

export function renderMarkdown(markdown: string): RenderedMarkdown {
  const file = processor.processSync(markdown);
  return { html: String(file), toc: (file.data as { toc?: TocEntry[] }).toc ?? [] };
}

/** Long write-ups get a table of contents: enough sections that a reader wants to jump. */
export function wantsToc(rendered: RenderedMarkdown): boolean {
  return rendered.toc.filter((t) => t.depth <= 3).length >= 4;
}
