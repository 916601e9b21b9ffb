/**
 * Markdown to searchable plain text with a handful of regular expressions: fast enough to run over
 * ten thousand write-ups per index build, and it only has to keep the words, not the layout.
 */
export function markdownToPlainText(markdown: string): string {
  return markdown
    .replace(/^ {0,3}(```|~~~).*$/gm, " ")
    .replace(/^ {0,3}\[[^\]]+\]:\s*\S+.*$/gm, " ")
    .replace(/!\[([^\]]*)\]\([^)]*\)/g, "$1")
    .replace(/\[([^\]]*)\]\([^)]*\)/g, "$1")
    .replace(/\[([^\]]*)\]\[[^\]]*\]/g, "$1")
    .replace(/<[^>\n]*>/g, " ")
    .replace(/^ {0,3}#{1,6}\s+/gm, "")
    .replace(/^ {0,3}>\s?/gm, "")
    .replace(/^\s*(?:[-*+]|\d+[.)])\s+(?:\[[ xX]\]\s+)?/gm, "")
    .replace(/^\s*\|?(?:\s*:?-{2,}:?\s*\|)+\s*:?-*:?\s*$/gm, " ")
    .replace(/^ {0,3}(?:[-*_]\s*){3,}$/gm, " ")
    .replace(/\|/g, " ")
    .replace(/(\*\*|__|~~|`+)/g, "")
    .replace(/(^|[\s(])[*_](?=\S)|(?<=\S)[*_](?=[\s).,;:!?]|$)/gm, "$1")
    .replace(/\s+/g, " ")
    .trim();
}
