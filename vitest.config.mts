import { defineConfig } from "vitest/config";
import path from "node:path";

// One config, three projects: unit (pure lib/), integration (real PostgreSQL and the
// running app over HTTP), e2e (Chromium). scripts/test.sh sets up what the last two need.
export default defineConfig({
  resolve: { alias: { "@": path.resolve(__dirname) } },
  test: {
    execArgv: ["--import", "tsx"],
    projects: [
      { extends: true, test: { name: "unit", include: ["tests/unit/**/*.test.ts"] } },
      {
        extends: true,
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: "e2e",
          include: ["tests/e2e/**/*.test.ts"],
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 60_000,
        },
      },
    ],
  },
});
