import { defineConfig } from "vitest/config";
import path from "node:path";

const root = path.resolve(__dirname, "..");

export default defineConfig({
  root,
  resolve: { alias: { "@": root, "server-only": path.join(root, "tests/support/server-only-stub.ts") } },
  test: {
    include: ["tests/unit/**/*.test.ts", "tests/integration/**/*.test.ts"],
    environment: "node",
    pool: "forks",
    fileParallelism: false,
    testTimeout: 30000,
    hookTimeout: 60000,
    globalSetup: ["tests/support/global-setup.ts"],
  },
});
