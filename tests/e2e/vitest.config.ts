import { defineConfig } from "vitest/config";
import path from "node:path";

const root = path.resolve(__dirname, "../..");

export default defineConfig({
  root,
  resolve: { alias: { "@": root, "server-only": path.join(root, "tests/support/server-only-stub.ts") } },
  test: {
    include: ["tests/e2e/**/*.e2e.ts"],
    environment: "node",
    pool: "forks",
    fileParallelism: false,
    testTimeout: 90000,
    hookTimeout: 90000,
    // The fault test restarts PostgreSQL under the test process's own pool; postgres.js 3.4 then
    // throws from a write it had scheduled on the socket the server closed. That is the test
    // harness's client, not the app (the server under test logs nothing), so only that is ignored.
    onUnhandledError(error) {
      const stack = error.stack ?? "";
      if (/reading 'write'/.test(error.message ?? "") && stack.includes("postgres/src/connection.js")) return false;
    },
  },
});
