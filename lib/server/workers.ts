import "server-only";
import { sep } from "node:path";
import { Worker } from "node:worker_threads";
import { AppError } from "@/lib/errors";

/** The worker-thread entries scripts/build-workers.mjs compiles into build/workers/<name>.mjs. */
export type WorkerName = "gpx-worker" | "heat-worker";

export interface WorkerLimits {
  timeoutMs: number;
  maxOldGenerationSizeMb: number;
  maxYoungGenerationSizeMb: number;
}

/** Jobs at a time per app instance (the machines have two cores); more wait their turn. */
const CONCURRENCY = 2;
const QUEUE_LIMIT = 16;
let running = 0;
const waiting: (() => void)[] = [];

async function slot<T>(task: () => Promise<T>): Promise<T> {
  if (running >= CONCURRENCY) {
    if (waiting.length >= QUEUE_LIMIT) throw new AppError("unavailable", "Fadeline is busy with other work. Try again in a minute.");
    await new Promise<void>((resolve) => waiting.push(resolve));
  }
  running++;
  try {
    return await task();
  } finally {
    running--;
    waiting.shift()?.();
  }
}

/**
 * Where a worker's code is: the compiled bundle in build/workers, or, under the tests (which run TypeScript
 * source), a bootstrap in FADELINE_WORKER_BOOTSTRAP_DIR that loads the same entry through tsx.
 */
function entryOf(name: WorkerName): string | URL {
  const bootstraps = process.env.FADELINE_WORKER_BOOTSTRAP_DIR;
  if (bootstraps) return new URL(`${name}.mjs`, bootstraps.endsWith("/") ? bootstraps : `${bootstraps}/`);
  return [process.cwd(), "build", "workers", `${name}.mjs`].join(sep);
}

export interface WorkerMessages {
  /** The message for a run that hit the time limit. */
  timeout: string;
  /** The message for a run that ran out of memory or crashed. */
  failed: string;
}

/**
 * Runs one job in a fresh worker thread with a memory ceiling and a time limit, off the request thread, and
 * resolves with the worker's one message. A worker that posts `{ crashed: true }`, throws, runs out of memory
 * or overruns is terminated and answered with a 422 carrying `messages`.
 */
export function runWorker<T>(name: WorkerName, data: unknown, limits: WorkerLimits, messages: WorkerMessages, transfer: ArrayBuffer[] = []): Promise<T> {
  return slot(
    () =>
      new Promise<T>((resolve, reject) => {
        const worker = new Worker(entryOf(name), {
          workerData: data,
          transferList: transfer,
          resourceLimits: { maxOldGenerationSizeMb: limits.maxOldGenerationSizeMb, maxYoungGenerationSizeMb: limits.maxYoungGenerationSizeMb },
        });
        let settled = false;
        const finish = (fn: () => void) => {
          if (settled) return;
          settled = true;
          clearTimeout(timer);
          void worker.terminate();
          fn();
        };
        const timer = setTimeout(() => finish(() => reject(new AppError("invalid_input", messages.timeout))), limits.timeoutMs);
        worker.once("message", (message: T & { crashed?: boolean; message?: string }) =>
          finish(() => {
            if (!message.crashed) return resolve(message);
            console.error(`[${name}] failed:`, message.message);
            reject(new AppError("invalid_input", messages.failed));
          }),
        );
        worker.once("error", (error) =>
          finish(() => {
            console.error(`[${name}] error:`, error.message);
            reject(new AppError("invalid_input", messages.failed));
          }),
        );
        worker.once("exit", (code) => finish(() => reject(new AppError("internal", `A background worker stopped unexpectedly (${code}).`))));
      }),
  );
}
