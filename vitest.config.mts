import path from "node:path";
import { defineConfig } from "vitest/config";

const alias = { "@": path.resolve(import.meta.dirname) };

export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      {
        resolve: { alias },
        // The exact cut-list search and the image pipeline take seconds on a loaded machine; 5 s is too tight there.
        test: { name: "unit", include: ["tests/unit/**/*.test.ts"], environment: "node", testTimeout: 20_000 },
      },
      {
        resolve: { alias },
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          environment: "node",
          globalSetup: ["tests/integration/global-setup.ts"],
          testTimeout: 20_000,
          hookTimeout: 60_000,
          // One app server for the run; files share it, so run them one after another.
          fileParallelism: false,
        },
      },
    ],
  },
});
