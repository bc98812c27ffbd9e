// Bundles the worker thread entry (lib/workers/entry.ts + the task registry + the pure physics
// it calls) into one standalone file, `.data/workers/entry.mjs`, that lib/workers/pool.ts starts
// as worker threads. Next.js bundles server code in its own way; a worker needs a file of its
// own at run time, so it is built here, before `next build` (npm start, npm test).
//
//   node scripts/build-workers.mjs [outFile]
//
// The worker may only reach pure code: an import of React, Next.js, the database, `server-only`
// or the app's server modules fails the build with the importer named.
import { mkdirSync, renameSync, writeFileSync } from "node:fs";
import path from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
export const WORKER_ENTRY_SOURCE = path.join(ROOT, "lib/workers/entry.ts");
export const WORKER_BUNDLE = path.join(ROOT, ".data/workers/entry.mjs");

const FORBIDDEN = [/^react($|\/|-)/, /^next($|\/)/, /^server-only$/, /^drizzle-orm($|\/)/, /^mysql2($|\/)/, /^@\/(db|app|components)\//, /^@\/lib\/(auth|http|jobs)/];

/** esbuild plugin: fails on imports the worker must not have. */
const pureOnly = {
  name: "seatwise-pure-only",
  setup(build) {
    build.onResolve({ filter: /.*/ }, (args) => {
      if (FORBIDDEN.some((re) => re.test(args.path))) {
        return { errors: [{ text: `the worker bundle may only import pure code, but ${path.relative(ROOT, args.importer)} imports "${args.path}"` }] };
      }
      return undefined;
    });
  },
};

/** Builds the bundle; the file is replaced atomically so a running server never reads half of it. */
export async function buildWorkers(outFile = WORKER_BUNDLE) {
  const esbuild = await import("esbuild");
  const result = await esbuild.build({
    entryPoints: [WORKER_ENTRY_SOURCE],
    bundle: true,
    platform: "node",
    format: "esm",
    target: "node20",
    tsconfig: path.join(ROOT, "tsconfig.json"),
    write: false,
    outfile: outFile,
    logLevel: "silent",
    plugins: [pureOnly],
  });
  const [file] = result.outputFiles;
  mkdirSync(path.dirname(outFile), { recursive: true });
  const temporary = `${outFile}.${process.pid}.${Date.now()}.tmp`;
  writeFileSync(temporary, file.contents);
  renameSync(temporary, outFile);
  return outFile;
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) {
  const started = performance.now();
  buildWorkers(process.argv[2] ? path.resolve(process.argv[2]) : undefined)
    .then((file) => console.log(`[seatwise] worker bundle ${path.relative(ROOT, file)} (${Math.round(performance.now() - started)} ms)`))
    .catch((error) => {
      console.error(`[seatwise] worker bundle failed: ${error.message}`);
      process.exit(1);
    });
}
