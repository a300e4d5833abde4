import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

const root = fileURLToPath(new URL(".", import.meta.url));

export default defineConfig({
  resolve: {
    alias: [
      { find: /^@\//, replacement: `${root}/` },
      // "server-only" throws outside React Server Components; under Vitest the db
      // modules are exercised directly, so the marker becomes an empty module.
      { find: /^server-only$/, replacement: `${root}/tests/support/empty.ts` },
    ],
  },
  test: {
    include: ["{lib,grammar,cli,db,pdf,tests/unit,tests/integration}/**/*.test.ts"],
    environment: "node",
    // Integration tests share one database; run files one at a time.
    fileParallelism: false,
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
