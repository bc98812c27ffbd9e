// `npm run bench`: runs every bench/*.bench.ts in turn, each in its own process so one
// benchmark's warm JIT or heap does not colour the next. Benchmarks print figures; none asserts.
import { spawnSync } from "node:child_process";
import { readdirSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";

const here = path.dirname(fileURLToPath(import.meta.url));
const only = process.argv.slice(2);
const files = readdirSync(here)
  .filter((f) => f.endsWith(".bench.ts"))
  .filter((f) => only.length === 0 || only.some((o) => f.includes(o)))
  .sort();

console.log(`Seatwise benchmarks — ${new Date().toISOString()} — ${os.cpus().length} cores (${os.cpus()[0]?.model ?? "unknown CPU"}), Node ${process.version}\n`);
let failed = 0;
for (const file of files) {
  const result = spawnSync(path.join(here, "../node_modules/.bin/tsx"), ["--conditions=react-server", path.join(here, file)], { stdio: "inherit" });
  if (result.status !== 0) {
    failed += 1;
    console.error(`\n${file} exited with ${result.status}`);
  }
  console.log("");
}
process.exit(failed === 0 ? 0 : 1);
