import js from "@eslint/js";
import tseslint from "typescript-eslint";
import reactHooks from "eslint-plugin-react-hooks";

const features = ["auth", "bench", "work-orders", "session", "flows", "review", "insight", "estimates", "settings", "users", "calculators", "home", "board"];

export default tseslint.config(
  { ignores: ["dist/**", "node_modules/**", "data/**", "data-load/**", "artifacts/**", "coverage/**", "drizzle/**"] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { parserOptions: { ecmaVersion: 2023, sourceType: "module" } },
    rules: {
      "no-console": ["error", { allow: ["warn", "error"] }],
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
      "@typescript-eslint/consistent-type-imports": "error",
    },
  },
  {
    files: ["src/**/*.{ts,tsx}"],
    plugins: { "react-hooks": reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      "no-restricted-imports": ["error", { patterns: [{ group: ["**/server/**", "**/server"], message: "The client never imports server code." }] }],
    },
  },
  {
    files: ["shared/**/*.ts"],
    rules: {
      "no-restricted-imports": ["error", { patterns: [{ group: ["**/server/**", "**/src/**", "express", "drizzle-orm", "drizzle-orm/*", "react", "react-dom"], message: "shared/ is pure: it imports neither server/ nor src/." }] }],
    },
  },
  {
    files: ["server/**/*.ts"],
    rules: {
      "no-restricted-imports": ["error", { patterns: [{ group: ["**/src/**", "**/src"], message: "The server never imports client code." }] }],
    },
  },
  ...features.map((feature) => ({
    files: [`src/features/${feature}/**/*.{ts,tsx}`],
    rules: {
      "no-restricted-imports": ["error", {
        patterns: [
          { group: ["**/server/**", "**/server"], message: "The client never imports server code." },
          { group: features.filter((f) => f !== feature).flatMap((f) => [`**/features/${f}/**`, `../../${f}/**`]), message: "Features do not import each other: move shared code to src/components or src/lib." },
        ],
      }],
    },
  })),
  {
    files: ["server/tools/**/*.ts", "tests/**/*.{ts,tsx}"],
    rules: { "no-console": "off" },
  },
);
