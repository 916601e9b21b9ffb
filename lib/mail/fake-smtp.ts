import http from "node:http";
import type { AddressInfo } from "node:net";
import { SMTPServer } from "smtp-server";
import { parseMessage, type ParsedMessage } from "./parse-message";

export interface CapturedMessage extends ParsedMessage {
  id: number;
  envelopeFrom: string;
  envelopeTo: string[];
  receivedAt: string;
  raw: string;
}

export interface FakeSmtp {
  port: number;
  controlPort: number | null;
  messages: CapturedMessage[];
  close: () => Promise<void>;
}

/**
 * A local SMTP server that accepts everything and keeps it in memory (never relays), plus an
 * optional HTTP control port on 127.0.0.1: GET /messages lists what it caught as JSON,
 * DELETE /messages forgets it. Port 0 picks a free port.
 */
export async function startFakeSmtp(options: { port: number; controlPort?: number | null; host?: string }): Promise<FakeSmtp> {
  const host = options.host ?? "127.0.0.1";
  const messages: CapturedMessage[] = [];
  let nextId = 1;
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    logger: false,
    size: 5 * 1024 * 1024,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (c: Buffer) => chunks.push(c));
      stream.on("end", () => {
        const raw = Buffer.concat(chunks).toString("utf8");
        messages.push({
          id: nextId++,
          envelopeFrom: session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
          envelopeTo: session.envelope.rcptTo.map((r) => r.address),
          receivedAt: new Date().toISOString(),
          raw,
          ...parseMessage(raw),
        });
        callback();
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    smtp.once("error", reject);
    smtp.listen(options.port, host, () => resolve());
  });
  const port = (smtp.server.address() as AddressInfo).port;

  let control: http.Server | null = null;
  if (options.controlPort !== undefined && options.controlPort !== null) {
    control = http.createServer((req, res) => {
      const json = (status: number, body: unknown) => {
        res.writeHead(status, { "content-type": "application/json" });
        res.end(JSON.stringify(body));
      };
      if (req.url?.split("?")[0] !== "/messages") return json(404, { error: "Only /messages is here." });
      if (req.method === "GET") return json(200, messages);
      if (req.method === "DELETE") {
        messages.length = 0;
        return json(200, { cleared: true });
      }
      return json(405, { error: "GET or DELETE." });
    });
    await new Promise<void>((resolve, reject) => {
      control!.once("error", reject);
      control!.listen(options.controlPort!, "127.0.0.1", () => resolve());
    });
  }
  const controlPort = control ? (control.address() as AddressInfo).port : null;

  return {
    port,
    controlPort,
    messages,
    close: async () => {
      await new Promise<void>((resolve) => smtp.close(() => resolve()));
      if (control) await new Promise<void>((resolve) => control!.close(() => resolve()));
    },
  };
}
