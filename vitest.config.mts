import { defineConfig } from "vitest/config";
import path from "node:path";
import { fileURLToPath } from "node:url";

// One config, four projects: unit (pure lib/), integration (real PostgreSQL and the
// running app over HTTP), e2e (Chromium), faults (the project's own PostgreSQL and file
// store stopped and started under the running app). scripts/test.sh sets up what the last
// three need; `npm run test:unit` runs the first alone, with nothing set up.
export default defineConfig({
  resolve: { alias: { "@": path.dirname(fileURLToPath(import.meta.url)) } },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          include: ["tests/unit/**/*.test.ts"],
          // Pure functions: the files share one worker and its loaded modules, and need no
          // tsx loader (vite compiles them), which is most of the start-up time saved.
          isolate: false,
          fileParallelism: false,
        },
      },
      {
        extends: true,
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          // Knex may load .ts files (knexfile, migrations) outside vite's pipeline.
          execArgv: ["--import", "tsx"],
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
          sequence: { groupOrder: 1 }, // with e2e, one file at a time, after unit
        },
      },
      {
        extends: true,
        test: {
          name: "e2e",
          include: ["tests/e2e/**/*.test.ts"],
          execArgv: ["--import", "tsx"],
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 60_000,
          sequence: { groupOrder: 1 },
        },
      },
      {
        extends: true,
        test: {
          name: "faults",
          include: ["tests/faults/**/*.test.ts"],
          execArgv: ["--import", "tsx"],
          fileParallelism: false,
          testTimeout: 90_000,
          hookTimeout: 90_000,
          // After every other project has finished: these stop the services the others use.
          // (Vitest runs groups in order; a project left at order 0 without file parallelism
          // would run last of all, hence the explicit orders.)
          sequence: { groupOrder: 2 },
        },
      },
    ],
  },
});
