import { defineConfig } from "drizzle-kit";
import { databaseUrl } from "./db/url";

export default defineConfig({
  schema: "./db/schema.ts",
  out: "./db/migrations",
  dialect: "postgresql",
  dbCredentials: { url: databaseUrl() },
  strict: true,
});
