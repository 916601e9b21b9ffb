import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

const config = [
  ...nextVitals,
  ...nextTs,
  { ignores: [".next/**", "node_modules/**", ".data/**", "cache/**", "db/migrations/**", "next-env.d.ts", "tests/e2e/screenshots/**"] },
];

export default config;
