import "server-only";
import { env } from "@/lib/env";

type HeaderSource = { get(name: string): string | null } | Record<string, string | string[] | undefined>;

function header(source: HeaderSource, name: string): string | null {
  if (typeof (source as { get?: unknown }).get === "function") return (source as { get(n: string): string | null }).get(name);
  const value = (source as Record<string, string | string[] | undefined>)[name];
  return Array.isArray(value) ? (value.at(-1) ?? null) : (value ?? null);
}

/**
 * The client address used for per-client rate limits. Each trusted reverse proxy appends the address it saw
 * to X-Forwarded-For, so with TRUSTED_PROXY_HOPS = n the client is the n-th entry from the right, and
 * anything a client wrote itself sits further left and is never used (OWASP ASVS 15.3.4). `next start` only
 * fills the header from the TCP peer when a request has none, so an app exposed without a proxy (hops 0, the
 * local set-up) cannot tell a forged header from a real one: production runs behind a TLS proxy with hops ≥ 1.
 * The per-account limit does not depend on this.
 */
export function clientIp(headers: HeaderSource): string {
  const chain = (header(headers, "x-forwarded-for") ?? "")
    .split(",")
    .map((s) => s.trim())
    .filter(Boolean);
  const hops = Math.max(1, env().TRUSTED_PROXY_HOPS);
  return chain[chain.length - hops] ?? chain[0] ?? "unknown";
}
