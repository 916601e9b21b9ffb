/** What the first bytes of a file say it is, whatever its name claims. */
export type SniffedKind = "jpeg" | "png" | "webp" | "gif" | "pdf" | "markup" | "unknown";

const MIME: Record<SniffedKind, string> = {
  jpeg: "image/jpeg",
  png: "image/png",
  webp: "image/webp",
  gif: "image/gif",
  pdf: "application/pdf",
  markup: "text/xml",
  unknown: "application/octet-stream",
};

const startsWith = (bytes: Uint8Array, signature: number[], at = 0) =>
  bytes.length >= at + signature.length && signature.every((b, i) => bytes[at + i] === b);
const ascii = (text: string) => [...text].map((c) => c.charCodeAt(0));

export function sniff(bytes: Uint8Array): { kind: SniffedKind; mime: string } {
  const kind = sniffKind(bytes);
  return { kind, mime: MIME[kind] };
}

function sniffKind(bytes: Uint8Array): SniffedKind {
  if (startsWith(bytes, [0xff, 0xd8, 0xff])) return "jpeg";
  if (startsWith(bytes, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return "png";
  if (startsWith(bytes, ascii("RIFF")) && startsWith(bytes, ascii("WEBP"), 8)) return "webp";
  if (startsWith(bytes, ascii("GIF87a")) || startsWith(bytes, ascii("GIF89a"))) return "gif";
  if (startsWith(bytes, ascii("%PDF-"))) return "pdf";
  if (looksLikeMarkup(bytes)) return "markup";
  return "unknown";
}

// SVG and HTML are text starting with "<" after an optional BOM and white space; both can carry script.
function looksLikeMarkup(bytes: Uint8Array): boolean {
  let i = startsWith(bytes, [0xef, 0xbb, 0xbf]) ? 3 : 0;
  while (i < bytes.length && i < 512 && (bytes[i] === 0x20 || bytes[i] === 0x09 || bytes[i] === 0x0a || bytes[i] === 0x0d)) i++;
  return bytes[i] === 0x3c;
}

/** Photos: the three raster formats every browser shows and sharp reads. */
export const PHOTO_KINDS = ["jpeg", "png", "webp"] as const;
export type PhotoKind = (typeof PHOTO_KINDS)[number];

export function isPhotoKind(kind: SniffedKind): kind is PhotoKind {
  return (PHOTO_KINDS as readonly string[]).includes(kind);
}

const DESCRIBED: Record<SniffedKind, string> = {
  jpeg: "a JPEG image",
  png: "a PNG image",
  webp: "a WebP image",
  gif: "a GIF image",
  pdf: "a PDF document",
  markup: "SVG, HTML or other markup",
  unknown: "not an image we recognise",
};

export function describeKind(kind: SniffedKind): string {
  return DESCRIBED[kind];
}
