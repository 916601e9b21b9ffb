import { isDemoMode } from "@/lib/auth/demo-mode";
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from "./accounts";

const [url = "http://localhost:3000", seconds] = process.argv.slice(2);
console.log(`\nRootbench is up at ${url}${seconds ? ` (ready in ${seconds} s)` : ""}`);
if (isDemoMode()) {
  console.log(`Demo workshop: invented data; every account shares the password ${DEMO_PASSWORD}:`);
  for (const a of DEMO_ACCOUNTS) console.log(`  ${a.role.padEnd(8)} ${a.email.padEnd(26)} ${a.name}`);
  console.log("For a shop of its own, start with ROOTBENCH_DEMO=0 on an empty database (see the README).");
} else {
  console.log(`A shop of its own (ROOTBENCH_DEMO=0): no demo data. On a new database, ${url}/setup creates the first administrator.`);
  console.log(`Mail goes to ${process.env.SMTP_HOST ?? "127.0.0.1"}:${process.env.SMTP_PORT ?? 2525}; links in it point at ${process.env.APP_URL ?? url}.`);
}
console.log("Stop with Ctrl+C.\n");
