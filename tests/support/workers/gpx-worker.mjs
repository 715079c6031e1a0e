// Under vitest the GPX worker entry is TypeScript source: load it through tsx inside the worker thread.
// The built app never uses this file; it runs the bundled entry (lib/server/routes/process-upload.ts).
import { tsImport } from "tsx/esm/api";

await tsImport("../../../lib/server/routes/gpx-worker.ts", import.meta.url);
