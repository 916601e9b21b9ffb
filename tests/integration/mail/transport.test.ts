import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import type { AddressInfo } from "node:net";
import os from "node:os";
import path from "node:path";
import { SMTPServer } from "smtp-server";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { smtpConfigFromEnv, smtpTransport } from "@/lib/mail/transport";

interface Seen { secure: boolean; user?: string; password?: string; to: string[] }

/** A relay that offers STARTTLS with a throwaway self-signed certificate and asks for a login. */
async function startRelay(options: { offerTls: boolean; requireLogin?: boolean }) {
  const seen: Seen[] = [];
  let login: { user?: string; password?: string } = {};
  const server = new SMTPServer({
    key: keyPem, cert: certPem, logger: false,
    disabledCommands: options.offerTls ? [] : ["STARTTLS"],
    authOptional: !options.requireLogin,
    onAuth(auth, _session, callback) {
      login = { user: auth.username, password: auth.password ?? undefined };
      callback(null, { user: auth.username });
    },
    onData(stream, session, callback) {
      stream.resume();
      stream.on("end", () => {
        seen.push({ secure: session.secure, ...login, to: session.envelope.rcptTo.map((r) => r.address) });
        callback();
      });
    },
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", () => resolve()));
  return { server, seen, port: (server.server.address() as AddressInfo).port };
}

let dir: string;
let keyPem: string;
let certPem: string;

describe("mail to a real relay", () => {
  beforeAll(() => {
    dir = mkdtempSync(path.join(os.tmpdir(), "rootbench-tls-"));
    execFileSync("openssl", ["req", "-x509", "-newkey", "rsa:2048", "-nodes", "-days", "1", "-subj", "/CN=127.0.0.1",
      "-addext", "subjectAltName=IP:127.0.0.1", "-keyout", path.join(dir, "key.pem"), "-out", path.join(dir, "cert.pem")], { stdio: "ignore" });
    keyPem = readFileSync(path.join(dir, "key.pem"), "utf8");
    certPem = readFileSync(path.join(dir, "cert.pem"), "utf8");
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it("reads the relay, credentials and TLS wishes from the environment", () => {
    expect(smtpConfigFromEnv({ SMTP_HOST: "relay.rootbench.test", SMTP_PORT: "587", SMTP_USER: "shop", SMTP_PASSWORD: "s3cret" } as unknown as NodeJS.ProcessEnv))
      .toEqual({ host: "relay.rootbench.test", port: 587, user: "shop", password: "s3cret", secure: false, requireTls: true });
    expect(smtpConfigFromEnv({} as unknown as NodeJS.ProcessEnv)).toMatchObject({ host: "127.0.0.1", port: 2525, user: undefined, requireTls: false });
  });

  it("upgrades with STARTTLS when the relay offers it and signs in with SMTP_USER / SMTP_PASSWORD over TLS", async () => {
    const relay = await startRelay({ offerTls: true, requireLogin: true });
    const transport = smtpTransport({ host: "127.0.0.1", port: relay.port, user: "shop-mailer", password: "relay-password", requireTls: true }, { ca: certPem });
    try {
      await transport.sendMail({ from: "shop@rootbench.test", to: "rider@rootbench.test", subject: "Your unit", text: "Ready." });
      expect(relay.seen).toEqual([{ secure: true, user: "shop-mailer", password: "relay-password", to: ["rider@rootbench.test"] }]);
    } finally {
      transport.close();
      await new Promise<void>((r) => relay.server.close(() => r()));
    }
  });

  it("uses STARTTLS unasked when offered, and plain SMTP with a relay that has none (the local fake)", async () => {
    const tls = await startRelay({ offerTls: true });
    const plain = await startRelay({ offerTls: false });
    const viaTls = smtpTransport({ host: "127.0.0.1", port: tls.port }, { ca: certPem });
    const viaPlain = smtpTransport({ host: "127.0.0.1", port: plain.port });
    try {
      await viaTls.sendMail({ from: "shop@rootbench.test", to: "a@rootbench.test", subject: "s", text: "t" });
      await viaPlain.sendMail({ from: "shop@rootbench.test", to: "b@rootbench.test", subject: "s", text: "t" });
      expect(tls.seen).toEqual([{ secure: true, to: ["a@rootbench.test"] }]);
      expect(plain.seen).toEqual([{ secure: false, to: ["b@rootbench.test"] }]);
    } finally {
      viaTls.close();
      viaPlain.close();
      await new Promise<void>((r) => tls.server.close(() => r()));
      await new Promise<void>((r) => plain.server.close(() => r()));
    }
  });

  it("refuses to send credentials to a relay that offers no STARTTLS", async () => {
    const plain = await startRelay({ offerTls: false });
    const transport = smtpTransport({ host: "127.0.0.1", port: plain.port, user: "shop-mailer", password: "relay-password", requireTls: true });
    try {
      await expect(transport.sendMail({ from: "shop@rootbench.test", to: "c@rootbench.test", subject: "s", text: "t" })).rejects.toThrow();
      expect(plain.seen).toEqual([]);
    } finally {
      transport.close();
      await new Promise<void>((r) => plain.server.close(() => r()));
    }
  });
});
