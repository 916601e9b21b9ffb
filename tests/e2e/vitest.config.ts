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
  },
});
