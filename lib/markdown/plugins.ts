import type { Element, ElementContent, Root } from "hast";
import type { VFile } from "vfile";

export interface TocEntry {
  depth: number;
  id: string;
  text: string;
}

export function textOf(node: ElementContent): string {
  if (node.type === "text") return node.value;
  if (node.type === "element") return node.children.map(textOf).join("");
  return "";
}

const HEADING = /^h([1-6])$/;
const isBlank = (nodes: ElementContent[]) => nodes.every((c) => c.type === "text" && !c.value.trim());

/**
 * Runs after the sanitiser, on a tree that is already safe: drops images whose source the schema
 * refused (and paragraphs left empty), unwraps links whose address it refused, marks outside links,
 * records the headings for a table of contents (file.data.toc) and gives each heading a link to itself.
 */
export function rehypeWriteupFinish() {
  return (tree: Root, file: VFile) => {
    const toc: TocEntry[] = [];

    const finish = (children: ElementContent[]): ElementContent[] =>
      children.flatMap((node): ElementContent[] => {
        if (node.type !== "element") return [node];
        const props = node.properties;
        if (node.tagName === "img") {
          if (typeof props.src !== "string") return [];
          Object.assign(props, { loading: "lazy", decoding: "async" });
          return [node];
        }
        node.children = finish(node.children);
        if (node.tagName === "a") {
          if (typeof props.href !== "string") return node.children;
          if (/^(https?|mailto):/i.test(props.href)) props.rel = ["nofollow", "noopener", "noreferrer"];
        }
        if (node.tagName === "p" && isBlank(node.children)) return [];
        const heading = HEADING.exec(node.tagName);
        if (heading && typeof props.id === "string") addAnchor(node, Number(heading[1]), props.id, toc);
        return [node];
      });

    tree.children = finish(tree.children as ElementContent[]) as Root["children"];
    (file.data as { toc?: TocEntry[] }).toc = toc;
  };
}

function addAnchor(node: Element, depth: number, id: string, toc: TocEntry[]): void {
  toc.push({ depth, id, text: node.children.map(textOf).join("").trim() });
  node.children.push({
    type: "element",
    tagName: "a",
    properties: { href: `#${id}`, className: ["heading-anchor"], ariaLabel: "Link to this section" },
    children: [{ type: "text", value: "#" }],
  });
}
