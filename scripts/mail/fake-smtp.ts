// Local stand-in for a mail server: keeps every message, relays none.
// SMTP on SMTP_PORT (default 2525); JSON control on 127.0.0.1:SMTP_CONTROL_PORT (default SMTP_PORT + 1).
import { exitWithParents } from "../../lib/mail/exit-with-parents";
import { startFakeSmtp } from "../../lib/mail/fake-smtp";

const port = Number(process.env.SMTP_PORT ?? 2525);
const controlPort = Number(process.env.SMTP_CONTROL_PORT ?? port + 1);

startFakeSmtp({ port, controlPort })
  .then((fake) => {
    console.log(`[fake-smtp] SMTP on 127.0.0.1:${fake.port}, messages at http://127.0.0.1:${fake.controlPort}/messages`);
    const stop = () => { fake.close().finally(() => process.exit(0)); };
    process.on("SIGTERM", stop);
    process.on("SIGINT", stop);
    exitWithParents(stop);
  })
  .catch((error: unknown) => {
    console.error("[fake-smtp] could not start:", error);
    process.exit(1);
  });
