import { defineConfig, globalIgnores } from "eslint/config";
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

export default defineConfig([
  ...nextVitals,
  ...nextTs,
  // No line over 140 characters (Prettier wraps code at 120 but never splits a string, comment or class list).
  { rules: { "max-len": ["error", { code: 140, tabWidth: 2 }] } },
  globalIgnores([".next/**", ".next-*/**", "out/**", "build/**", "data/**", "next-env.d.ts", "tests/e2e/artifacts/**"]),
]);
