// Calls a server action the way the browser does: a POST to the page that uses it, with the
// action's id in the Next-Action header and its arguments encoded, and the answer decoded, by
// React's own flight client (the copy Next ships, so it speaks the server's version).
import { readFileSync } from "node:fs";
import path from "node:path";
import { createRequire } from "node:module";

const require = createRequire(import.meta.url);
const flight = require("next/dist/compiled/react-server-dom-webpack/client.edge") as {
  encodeReply(value: unknown): Promise<FormData | string>;
  createFromReadableStream<T>(stream: ReadableStream<Uint8Array>, options: object): Promise<T>;
};

interface ManifestEntry { filename?: string; exportedName?: string }

/** The id the production build gave `exportName` of `file` (from .next/server/server-reference-manifest.json). */
export function serverActionId(file: string, exportName: string, root = process.cwd()): string {
  const manifest = JSON.parse(readFileSync(path.join(root, ".next/server/server-reference-manifest.json"), "utf8")) as { node: Record<string, ManifestEntry> };
  const found = Object.entries(manifest.node).find(([, entry]) => entry.filename === file && entry.exportedName === exportName);
  if (!found) throw new Error(`No server action ${exportName} of ${file} in this build; run next build first.`);
  return found[0];
}

export interface ActionCall {
  baseUrl: string;
  /** The page the action is posted to, as the browser would: the page that uses it. */
  pagePath: string;
  actionId: string;
  cookie: string;
  args: unknown[];
}

/** What the action returned, or the HTTP status when the server did not run it. */
export async function callServerAction<T>(call: ActionCall): Promise<{ status: number; value: T | null }> {
  const body = await flight.encodeReply(call.args);
  const response = await fetch(`${call.baseUrl}${call.pagePath}`, {
    method: "POST",
    headers: { "next-action": call.actionId, accept: "text/x-component", cookie: call.cookie, origin: call.baseUrl },
    body,
  });
  if (!response.ok || !response.body || !response.headers.get("content-type")?.includes("text/x-component")) {
    await response.text().catch(() => "");
    return { status: response.status, value: null };
  }
  const root = await flight.createFromReadableStream<{ a: Promise<T> }>(response.body, {
    serverConsumerManifest: { moduleMap: {}, moduleLoading: null, serverModuleMap: null },
  });
  return { status: response.status, value: await root.a };
}
