// No hooks and no server imports: the article page (server) and the editor preview (browser) both use it.
const BODY_STYLES = [
  "max-w-none text-ink leading-7",
  "[&_h1]:mt-8 [&_h1]:mb-3 [&_h2]:mt-8 [&_h2]:mb-2 [&_h2]:text-xl [&_h3]:mt-6 [&_h3]:mb-2 [&_h3]:text-base [&_h3]:font-semibold [&_h4]:mt-4 [&_h4]:font-semibold",
  "[&_h1]:scroll-mt-4 [&_h2]:scroll-mt-4 [&_h3]:scroll-mt-4",
  "[&_.heading-anchor]:ml-2 [&_.heading-anchor]:text-ink-faint [&_.heading-anchor]:no-underline [&_.heading-anchor]:opacity-0 [&_.heading-anchor:focus]:opacity-100 [&_h1:hover_.heading-anchor]:opacity-100 [&_h2:hover_.heading-anchor]:opacity-100 [&_h3:hover_.heading-anchor]:opacity-100",
  "[&_p]:my-3 [&_ul]:my-3 [&_ul]:list-disc [&_ul]:pl-6 [&_ol]:my-3 [&_ol]:list-decimal [&_ol]:pl-6 [&_li]:my-1 [&_.task-list-item]:list-none",
  "[&_blockquote]:my-4 [&_blockquote]:border-l-4 [&_blockquote]:border-copper-light [&_blockquote]:pl-4 [&_blockquote]:text-ink-soft",
  "[&_table]:my-4 [&_table]:w-full [&_table]:border-collapse [&_table]:text-sm [&_th]:border-b-2 [&_th]:border-ink-faint/40 [&_th]:px-2 [&_th]:py-1 [&_th]:text-left [&_td]:border-b [&_td]:border-ink-faint/20 [&_td]:px-2 [&_td]:py-1",
  "[&_pre]:my-4 [&_pre]:whitespace-pre-wrap [&_pre]:break-words [&_pre]:rounded-md [&_pre]:bg-ink [&_pre]:p-3 [&_pre]:text-paper [&_code]:font-mono [&_code]:text-sm [&_:not(pre)>code]:rounded [&_:not(pre)>code]:bg-paper-deep [&_:not(pre)>code]:px-1",
  "[&_img]:my-4 [&_img]:h-auto [&_img]:max-w-full [&_img]:rounded-md [&_img]:border [&_img]:border-ink-faint/30 [&_hr]:my-6 [&_hr]:border-ink-faint/30",
].join(" ");

/** Shows HTML from lib/markdown's renderMarkdown, which has already been through the sanitiser. */
export function MarkdownBody({ html, testId }: { html: string; testId?: string }) {
  return <div className={BODY_STYLES} data-testid={testId} dangerouslySetInnerHTML={{ __html: html }} />;
}
