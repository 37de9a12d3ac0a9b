// ESLint 9, flat config: Next.js's own rules (core web vitals, with React and its hooks,
// jsx-a11y and import) and typescript-eslint's recommended rules. `npm run lint` allows no
// warning, and `npm test` runs it before the tests.
import { defineConfig, globalIgnores } from "eslint/config";
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTypescript from "eslint-config-next/typescript";

export default defineConfig([
  ...nextVitals,
  ...nextTypescript,
  globalIgnores([".next/**", ".data/**", "node_modules/**", "next-env.d.ts", "tests/e2e/screenshots/**"]),
  {
    rules: {
      // The React Compiler is not used here, so a hook it cannot memoise (TanStack Table's) costs nothing.
      "react-hooks/incompatible-library": "off",
      // A leading underscore marks a value left out on purpose (`const { kind: _kind, ...rest } = row`).
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_", destructuredArrayIgnorePattern: "^_", caughtErrors: "none" }],
    },
  },
  {
    // Tests read the API's JSON answers loosely, as a client written in any language would.
    files: ["tests/**"],
    rules: { "@typescript-eslint/no-explicit-any": "off" },
  },
]);
