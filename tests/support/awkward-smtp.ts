import net from "node:net";

export interface AwkwardSmtp {
  port: number;
  /** Every message the server accepted, by its Message-ID header. */
  accepted: string[];
  /** Stops listening (connections already open are dropped); `up` listens again on the same port. */
  down: () => Promise<void>;
  up: () => Promise<void>;
  close: () => Promise<void>;
}

/**
 * A minimal SMTP server (RFC 5321 commands HELO/EHLO, MAIL, RCPT, DATA, RSET, NOOP, QUIT) that is
 * hard to deliver to: it waits `acceptDelayMs` before answering the end of DATA, and after every
 * `hangUpEvery`-th message it answers 250 and drops the connection at once, so the client sees
 * the acceptance and then a lost connection. It keeps no relay and counts what it accepted.
 */
export async function startAwkwardSmtp(options: { acceptDelayMs: number; hangUpEvery: number }): Promise<AwkwardSmtp> {
  const accepted: string[] = [];
  const sockets = new Set<net.Socket>();

  const handle = (socket: net.Socket) => {
    sockets.add(socket);
    socket.on("close", () => sockets.delete(socket));
    socket.on("error", () => {});
    let buffer = "";
    let inData = false;
    const reply = (line: string) => { if (!socket.destroyed) socket.write(`${line}\r\n`); };
    reply("220 awkward.test ESMTP");
    socket.on("data", (chunk) => {
      buffer += chunk.toString("latin1");
      for (;;) {
        if (inData) {
          const end = buffer.indexOf("\r\n.\r\n");
          if (end < 0) return;
          const message = buffer.slice(0, end);
          buffer = buffer.slice(end + 5);
          inData = false;
          const id = /^message-id:\s*(\S+)/im.exec(message)?.[1] ?? "(none)";
          setTimeout(() => {
            if (socket.destroyed) return;
            accepted.push(id);
            reply("250 2.0.0 queued");
            if (accepted.length % options.hangUpEvery === 0) socket.destroy();
          }, options.acceptDelayMs);
          continue;
        }
        const eol = buffer.indexOf("\r\n");
        if (eol < 0) return;
        const line = buffer.slice(0, eol);
        buffer = buffer.slice(eol + 2);
        const verb = line.slice(0, 4).toUpperCase();
        if (verb === "EHLO" || verb === "HELO") reply("250 awkward.test");
        else if (verb === "MAIL" || verb === "RCPT" || verb === "RSET" || verb === "NOOP") reply("250 2.0.0 ok");
        else if (verb === "DATA") { inData = true; reply("354 end with <CRLF>.<CRLF>"); }
        else if (verb === "QUIT") { reply("221 2.0.0 bye"); socket.end(); return; }
        else reply("502 5.5.2 not implemented");
      }
    });
  };

  let server = net.createServer(handle);
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const port = (server.address() as net.AddressInfo).port;

  const down = async () => {
    for (const s of sockets) s.destroy();
    await new Promise<void>((resolve) => server.close(() => resolve()));
  };
  const up = async () => {
    server = net.createServer(handle);
    await new Promise<void>((resolve, reject) => { server.once("error", reject); server.listen(port, "127.0.0.1", resolve); });
  };
  return { port, accepted, down, up, close: async () => { if (server.listening) await down(); } };
}
