import nextConfig from "eslint-config-next/core-web-vitals";
import tseslint from "typescript-eslint";

const physicsFolders = ["lib/comfort/**", "lib/viewfactor/**", "lib/panels/**", "lib/loads/**", "lib/energy/**"];

const config = [
  { ignores: [".next/**", ".next-*/**", "node_modules/**", ".data/**", "drizzle/**", "next-env.d.ts", "test-results/**"] },
  ...nextConfig,
  ...tseslint.configs.recommended,
  {
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
    },
  },
  {
    // The physics core is a small numerical library: no framework, database or app imports.
    files: physicsFolders,
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            { group: ["react", "react-*", "next", "next/*", "@/app/*", "@/components/*", "@/db/*", "drizzle-orm", "drizzle-orm/*", "mysql2", "mysql2/*", "server-only"], message: "Physics modules stay pure: no React, Next.js, database or app imports." },
            { group: ["@/lib/*", "!@/lib/comfort", "!@/lib/comfort/*", "!@/lib/viewfactor", "!@/lib/viewfactor/*", "!@/lib/panels", "!@/lib/panels/*", "!@/lib/loads", "!@/lib/loads/*", "!@/lib/energy", "!@/lib/energy/*"], message: "Physics modules import only other physics modules." },
          ],
        },
      ],
    },
  },
];

export default config;
