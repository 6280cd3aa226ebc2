import boundaries from "eslint-plugin-boundaries";
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTypescript from "eslint-config-next/typescript";

// The layers, top to bottom; a file may import its own layer and the ones below it:
// app -> components -> lib/<feature> -> db -> lib/engineering. Pages and route handlers read db/ stores directly;
// anything that does more than one store call (a state move, mail, files, solving) is a lib/<feature> workflow.
const LAYERS = [
  { type: "engineering", pattern: "lib/engineering/**", partialMatch: false },
  { type: "feature", pattern: "lib/**", partialMatch: false },
  { type: "db", pattern: "db/**", partialMatch: false },
  { type: "components", pattern: "components/**", partialMatch: false },
  { type: "app", pattern: "app/**", partialMatch: false },
];
const MAY_IMPORT = {
  app: ["app", "components", "feature", "db", "engineering"],
  components: ["components", "feature", "engineering"],
  feature: ["feature", "db", "engineering"],
  db: ["db", "engineering"],
  engineering: ["engineering"],
};

const config = [
  ...nextVitals,
  ...nextTypescript,
  {
    rules: {
      "@typescript-eslint/no-unused-vars": [
        "warn",
        { argsIgnorePattern: "^_", varsIgnorePattern: "^_", ignoreRestSiblings: true },
      ],
    },
  },
  {
    files: ["app/**", "components/**", "lib/**", "db/**", "proxy.ts"],
    plugins: { boundaries },
    settings: {
      "boundaries/elements": LAYERS,
      "import/resolver": { typescript: { alwaysTryTypes: true } },
    },
    rules: {
      "boundaries/dependencies": [
        "error",
        {
          default: "disallow",
          policies: Object.entries(MAY_IMPORT).map(([from, to]) => ({
            from: { element: { type: from } },
            allow: { to: { element: { types: { anyOf: to } } } },
          })),
        },
      ],
    },
  },
  {
    // The trade math is plain TypeScript: no framework, database or I/O, only its math library.
    files: ["lib/engineering/**"],
    rules: {
      "no-restricted-imports": [
        "error",
        { patterns: [{ regex: "^(?!mathjs$|\\./|\\.\\./)", message: "lib/engineering imports only itself and mathjs." }] },
      ],
    },
  },
  { ignores: [".next/**", ".next-test/**", ".data/**", "node_modules/**", "test-results/**", "playwright-report/**", "next-env.d.ts"] },
];
export default config;
