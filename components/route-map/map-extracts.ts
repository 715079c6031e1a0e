/**
 * Regional PMTiles extracts that an operator lists in `public/tiles/extracts.json`:
 *
 *     { "extracts": [{ "id": "demo-region", "url": "/tiles/demo-region.pmtiles", "name": "…",
 *                      "attribution": "…", "minzoom": 0, "maxzoom": 12 }] }
 *
 * The map fetches the file once per page. A missing or unreadable file means "no extracts"; a bad entry is
 * logged and skipped, never fatal, because a typo in an operator's config must not take the map down.
 * Validation is pure ({@link parseExtractsConfig}) so the tests cover it without a browser.
 */
import type { BasemapExtract } from "@/lib/map/basemap-style";

/** Where the client reads the extract list (served statically from public/). */
export const EXTRACTS_CONFIG_URL = "/tiles/extracts.json";

/** Most extracts used; more would slow every map for little gain. */
export const MAX_EXTRACTS = 16;

/** A validated extract. */
export interface MapExtract extends BasemapExtract {
  /** Human name for logs and the operator (plain text). */
  name: string;
}

/** Outcome of {@link parseExtractsConfig}: the usable extracts and one message per rejected part. */
export interface ExtractsConfig {
  extracts: MapExtract[];
  problems: string[];
}

const ID = /^[a-z0-9](?:[a-z0-9-]{0,38}[a-z0-9])?$/;
// Same-origin archives in public/tiles only: the CSP allows no other origin, and no path may climb out.
const URL_PATTERN = /^\/tiles\/[A-Za-z0-9][A-Za-z0-9_-]*(?:\.[A-Za-z0-9_-]+)*\.pmtiles$/;
const MAX_TEXT = 200;
const MAX_ZOOM = 24;

function text(entry: Record<string, unknown>, key: string, where: string, problems: string[]): string | undefined {
  const v = entry[key];
  if (typeof v !== "string" || v.trim() === "") {
    problems.push(`${where}: "${key}" must be a non-empty string`);
    return undefined;
  }
  if (v.length > MAX_TEXT) {
    problems.push(`${where}: "${key}" is longer than ${MAX_TEXT} characters`);
    return undefined;
  }
  return v.trim();
}

function zoom(entry: Record<string, unknown>, key: "minzoom" | "maxzoom", where: string, problems: string[]): number | null | undefined {
  const v = entry[key];
  if (v === undefined) return undefined;
  if (typeof v !== "number" || !Number.isInteger(v) || v < 0 || v > MAX_ZOOM) {
    problems.push(`${where}: "${key}" must be a whole number from 0 to ${MAX_ZOOM}`);
    return null;
  }
  return v;
}

function parseEntry(raw: unknown, index: number, seen: Set<string>, problems: string[]): MapExtract | null {
  const where = `extracts[${index}]`;
  if (typeof raw !== "object" || raw === null || Array.isArray(raw)) {
    problems.push(`${where}: must be an object`);
    return null;
  }
  const entry = raw as Record<string, unknown>;
  const before = problems.length;
  const id = text(entry, "id", where, problems);
  if (id !== undefined && !ID.test(id)) problems.push(`${where}: "id" must be 1–40 lower-case letters, digits or dashes`);
  if (id !== undefined && seen.has(id)) problems.push(`${where}: "id" ${JSON.stringify(id)} is used twice`);
  const url = text(entry, "url", where, problems);
  if (url !== undefined && !URL_PATTERN.test(url)) problems.push(`${where}: "url" must look like /tiles/<file>.pmtiles`);
  const name = text(entry, "name", where, problems);
  const attribution = text(entry, "attribution", where, problems);
  const minzoom = zoom(entry, "minzoom", where, problems);
  const maxzoom = zoom(entry, "maxzoom", where, problems);
  if (typeof minzoom === "number" && typeof maxzoom === "number" && minzoom > maxzoom) {
    problems.push(`${where}: "minzoom" is above "maxzoom"`);
  }
  if (problems.length > before || !id || !url || !name || !attribution) return null;
  seen.add(id);
  return {
    id,
    url,
    name,
    attribution,
    ...(typeof minzoom === "number" ? { minzoom } : {}),
    ...(typeof maxzoom === "number" ? { maxzoom } : {}),
  };
}

/**
 * Validates the parsed JSON of extracts.json. Anything that is not `{ "extracts": [...] }` gives no extracts;
 * each bad entry is skipped with a message naming it, and the good ones are kept in order.
 * @param json the parsed file (any value)
 */
export function parseExtractsConfig(json: unknown): ExtractsConfig {
  if (typeof json !== "object" || json === null || !Array.isArray((json as { extracts?: unknown }).extracts)) {
    return { extracts: [], problems: ['extracts.json must be an object with an "extracts" array'] };
  }
  const list = (json as { extracts: unknown[] }).extracts;
  const problems: string[] = [];
  const seen = new Set<string>();
  const extracts: MapExtract[] = [];
  list.forEach((raw, i) => {
    const x = parseEntry(raw, i, seen, problems);
    if (!x) return;
    if (extracts.length >= MAX_EXTRACTS) problems.push(`extracts[${i}]: only the first ${MAX_EXTRACTS} extracts are used`);
    else extracts.push(x);
  });
  return { extracts, problems };
}

/** Options of {@link loadMapExtracts}. */
export interface LoadMapExtractsOptions {
  /** Config location; default {@link EXTRACTS_CONFIG_URL}. */
  url?: string;
  /** Fetch implementation (tests pass a fake); default the global one. */
  fetchImpl?: typeof fetch;
  /** Where problems are reported; default `console.warn`. */
  warn?: (message: string) => void;
}

/**
 * Fetches and validates the operator's extract list. Never throws: a 404 (no file) quietly means none, and
 * any other failure is reported through `warn` and also means none.
 * @returns the usable extracts, in the file's order
 */
export async function loadMapExtracts(options: LoadMapExtractsOptions = {}): Promise<MapExtract[]> {
  const url = options.url ?? EXTRACTS_CONFIG_URL;
  const warn = options.warn ?? ((m: string) => console.warn(m));
  try {
    const res = await (options.fetchImpl ?? fetch)(url, { headers: { accept: "application/json" } });
    if (res.status === 404) return [];
    if (!res.ok) {
      warn(`Map extracts: ${url} answered ${res.status}; drawing the world basemap only.`);
      return [];
    }
    const { extracts, problems } = parseExtractsConfig(await res.json());
    for (const p of problems) warn(`Map extracts: ${p}; skipped.`);
    return extracts;
  } catch (error) {
    warn(`Map extracts: could not read ${url} (${error instanceof Error ? error.message : String(error)}); drawing the world basemap only.`);
    return [];
  }
}
