import { DEMO_ACCOUNTS, DEMO_PASSWORD } from "./accounts";

const [url = "http://localhost:3000", seconds] = process.argv.slice(2);
console.log(`\nRootbench is up at ${url}${seconds ? ` (ready in ${seconds} s)` : ""}`);
console.log(`Demo accounts (password: ${DEMO_PASSWORD}):`);
for (const a of DEMO_ACCOUNTS) console.log(`  ${a.role.padEnd(8)} ${a.email.padEnd(26)} ${a.name}`);
console.log("Stop with Ctrl+C.\n");
