// Under vitest the heat worker entry is TypeScript source: load it through tsx inside the worker thread.
import { tsImport } from "tsx/esm/api";

await tsImport("../../../lib/server/analyses/heat-worker.ts", import.meta.url);
