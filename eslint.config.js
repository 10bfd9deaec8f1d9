import js from "@eslint/js";
import tseslint from "typescript-eslint";
import reactHooks from "eslint-plugin-react-hooks";
import globals from "globals";
import { defineConfig, globalIgnores } from "eslint/config";

/** Packages and folders the pure engine must never reach: it is plain data in, plain data out. */
const engineForbidden = {
  paths: [
    { name: "react", message: "The engine is pure: no React." },
    { name: "react-dom", message: "The engine is pure: no React." },
    { name: "express", message: "The engine is pure: no Express." },
    { name: "sequelize", message: "The engine is pure: no database." },
    { name: "mariadb", message: "The engine is pure: no database." },
    { name: "fs", message: "The engine is pure: no file system." },
    { name: "node:fs", message: "The engine is pure: no file system." },
    { name: "node:fs/promises", message: "The engine is pure: no file system." },
    { name: "http", message: "The engine is pure: no network." },
    { name: "node:http", message: "The engine is pure: no network." },
    { name: "replicad", message: "The engine is pure: kernel work lives in server/kernel." },
  ],
  patterns: [
    { group: ["react/*", "react-dom/*", "@react-three/*", "three", "@tanstack/*"], message: "The engine is pure: no UI." },
    { group: ["@server/*", "**/server/**"], message: "The engine may not import server code." },
    { group: ["@/features/*", "@/app/*", "@/components/*", "@/lib/*"], message: "The engine may not import client code." },
  ],
};

export default defineConfig([
  globalIgnores(["dist/**", "node_modules/**", ".data/**", "coverage/**", "tests/fixtures/**", ".tmp/**"]),
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
    },
  },
  {
    files: ["src/**/*.{ts,tsx}"],
    plugins: { "react-hooks": reactHooks },
    rules: { "react-hooks/rules-of-hooks": "error", "react-hooks/exhaustive-deps": "warn" },
  },
  {
    files: ["src/engine/**/*.ts", "src/shared/**/*.ts"],
    rules: { "no-restricted-imports": ["error", engineForbidden] },
  },
  {
    files: ["src/**/*.{ts,tsx}"],
    ignores: ["src/engine/**", "src/shared/**"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [{ group: ["@server/*", "**/server/**"], message: "Client code may not import server code." }],
        },
      ],
    },
  },
]);
