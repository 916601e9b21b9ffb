import { defineConfig } from "vitest/config";
import path from "node:path";

const root = path.resolve(__dirname, "../..");

// The several-process test: run by scripts/test.sh after it has started two app processes,
// HAProxy and the fake S3 (CLUSTER_BASE_URL, CLUSTER_APP_URLS, DATABASE_URL, S3_*).
export default defineConfig({
  root,
  resolve: { alias: { "@": root, "server-only": path.join(root, "tests/support/server-only-stub.ts") } },
  test: {
    include: ["tests/cluster/**/*.test.ts"],
    environment: "node",
    pool: "forks",
    fileParallelism: false,
    testTimeout: 90000,
    hookTimeout: 90000,
  },
});
