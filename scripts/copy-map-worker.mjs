// maplibre-gl 6 loads its worker as a module from a URL next to its own bundle, which is not in
// Next's chunks; we serve a copy from public/ that always matches the installed package.
import { copyFileSync, existsSync, mkdirSync } from "node:fs";

const source = "node_modules/maplibre-gl/dist/maplibre-gl-worker.mjs";
if (existsSync(source)) {
  mkdirSync("public", { recursive: true });
  copyFileSync(source, "public/maplibre-gl-worker.mjs");
}
