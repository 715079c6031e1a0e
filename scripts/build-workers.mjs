// Compiles the server's worker-thread entries into self-contained ES modules in build/workers/. Next's
// bundler copies a `new Worker(new URL("./x.ts"))` entry as a raw asset instead of compiling it, so the
// workers are built here, before `next build`, and started from this folder at run time.
import { build } from "esbuild";
import { fileURLToPath } from "node:url";

const root = fileURLToPath(new URL("..", import.meta.url));
const started = Date.now();
await build({
  entryPoints: { "gpx-worker": "lib/server/routes/gpx-worker.ts", "heat-worker": "lib/server/analyses/heat-worker.ts" },
  absWorkingDir: root,
  outdir: "build/workers",
  outExtension: { ".js": ".mjs" },
  bundle: true,
  platform: "node",
  format: "esm",
  target: "node20",
  alias: { "@": root },
  sourcemap: true,
  logLevel: "warning",
});
console.log(`workers built in ${Date.now() - started} ms (build/workers)`);
