/**
 * Just enough MIME for the local fake SMTP server to show what it caught: headers (with RFC 2047
 * encoded words), and the text/plain and text/html parts in quoted-printable, base64 or 7/8 bit.
 */
export interface ParsedMessage {
  subject: string;
  from: string;
  to: string;
  text: string;
  html: string;
}

type Headers = Map<string, string>;

function splitHead(raw: string): { headers: Headers; body: string } {
  const at = raw.search(/\r?\n\r?\n/);
  const head = at < 0 ? raw : raw.slice(0, at);
  const body = at < 0 ? "" : raw.slice(at).replace(/^\r?\n\r?\n/, "");
  const headers: Headers = new Map();
  for (const line of head.replace(/\r?\n[ \t]+/g, " ").split(/\r?\n/)) {
    const colon = line.indexOf(":");
    if (colon > 0) headers.set(line.slice(0, colon).trim().toLowerCase(), line.slice(colon + 1).trim());
  }
  return { headers, body };
}

function decodeQuotedPrintable(value: string): Buffer {
  const soft = value.replace(/=\r?\n/g, "");
  const bytes: number[] = [];
  for (let i = 0; i < soft.length; i++) {
    const hex = soft.slice(i + 1, i + 3);
    if (soft[i] === "=" && /^[0-9A-Fa-f]{2}$/.test(hex)) {
      bytes.push(parseInt(hex, 16));
      i += 2;
    } else {
      bytes.push(...Buffer.from(soft[i], "utf8"));
    }
  }
  return Buffer.from(bytes);
}

export function decodeWords(value: string): string {
  return value
    .replace(/\?=\s+=\?/g, "?==?")
    .replace(/=\?([^?]+)\?([QqBb])\?([^?]*)\?=/g, (_m, _charset: string, enc: string, data: string) =>
      enc.toUpperCase() === "B"
        ? Buffer.from(data, "base64").toString("utf8")
        : decodeQuotedPrintable(data.replace(/_/g, " ")).toString("utf8"));
}

function decodeBody(body: string, encoding: string | undefined): string {
  const enc = (encoding ?? "").toLowerCase();
  if (enc === "base64") return Buffer.from(body.replace(/\s+/g, ""), "base64").toString("utf8");
  if (enc === "quoted-printable") return decodeQuotedPrintable(body).toString("utf8");
  return body;
}

function collect(raw: string, out: { text: string; html: string }): void {
  const { headers, body } = splitHead(raw);
  const type = headers.get("content-type") ?? "text/plain";
  const boundary = /boundary="?([^";]+)"?/i.exec(type)?.[1];
  if (/^multipart\//i.test(type) && boundary) {
    const parts = body.split(`--${boundary}`).slice(1);
    for (const part of parts) {
      if (part.startsWith("--")) break;
      collect(part.replace(/^\r?\n/, ""), out);
    }
    return;
  }
  const decoded = decodeBody(body, headers.get("content-transfer-encoding")).replace(/\r\n/g, "\n").trimEnd();
  if (/^text\/html/i.test(type)) out.html ||= decoded;
  else if (/^text\/plain/i.test(type)) out.text ||= decoded;
}

export function parseMessage(raw: string): ParsedMessage {
  const { headers } = splitHead(raw);
  const out = { text: "", html: "" };
  collect(raw, out);
  return {
    subject: decodeWords(headers.get("subject") ?? ""),
    from: decodeWords(headers.get("from") ?? ""),
    to: decodeWords(headers.get("to") ?? ""),
    ...out,
  };
}
