import js from "@eslint/js";
import tseslint from "typescript-eslint";

export default tseslint.config(
  { ignores: ["dist/", "dist.*/", ".astro/", "node_modules/", "bench/out/", "test/screenshots/"] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    // Config files run in Node.
    files: ["*.mjs", "*.js"],
    languageOptions: { globals: { process: "readonly" } },
  },
  {
    files: ["**/*.ts"],
    rules: {
      // Unused arguments named with a leading underscore document an interface.
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_" }],
    },
  },
  {
    // The engine must run in the browser, the CLI and the build alike.
    files: ["src/core/**/*.ts", "rules/**/*.ts"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            {
              group: ["node:*", "astro", "astro:*", "fs", "path"],
              message: "src/core and rules/ stay pure: no Node, Astro or DOM imports.",
            },
          ],
        },
      ],
    },
  },
);
