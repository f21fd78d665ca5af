import { defineConfig, mergeConfig } from "vitest/config";
import viteConfig from "./vite.config.ts";

export default mergeConfig(
  viteConfig,
  defineConfig({
    test: {
      projects: [
        {
          extends: true,
          test: { name: "unit", environment: "node", include: ["tests/unit/**/*.test.ts"] },
        },
        {
          extends: true,
          test: {
            name: "server",
            environment: "node",
            include: ["tests/server/**/*.test.ts"],
            setupFiles: ["tests/server/setup.ts"],
            testTimeout: 30_000,
            hookTimeout: 60_000,
          },
        },
        {
          extends: true,
          test: {
            name: "components",
            environment: "jsdom",
            include: ["tests/components/**/*.test.tsx"],
            setupFiles: ["tests/components/setup.ts"],
            // Typing a whole intake form key by key takes seconds when the machine is busy.
            testTimeout: 15_000,
          },
        },
        {
          extends: true,
          test: {
            name: "e2e",
            environment: "node",
            include: ["tests/e2e/**/*.test.ts"],
            testTimeout: 120_000,
            hookTimeout: 180_000,
            fileParallelism: false,
          },
        },
      ],
    },
  }),
);
