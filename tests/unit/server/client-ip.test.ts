/**
 * The client address for rate limits: with n trusted proxies that each append the address they saw
 * (the X-Forwarded-For convention, RFC 7239 §5.2 describes the same for Forwarded), the client is the n-th
 * entry from the right, and entries a client wrote itself are ignored.
 */
import { beforeEach, expect, it, vi } from "vitest";
import { applyTestEnv } from "../../support/test-env";

beforeEach(() => vi.resetModules());

async function ipWith(hops: string, xff: string) {
  applyTestEnv({ TRUSTED_PROXY_HOPS: hops });
  const { clientIp } = await import("@/lib/server/client-ip");
  return clientIp(new Headers({ "x-forwarded-for": xff }));
}

it("behind one proxy, a forged entry on the left is ignored", async () => {
  expect(await ipWith("1", "6.6.6.6, 203.0.113.7")).toBe("203.0.113.7");
});
it("behind two proxies, the client is second from the right", async () => {
  expect(await ipWith("2", "6.6.6.6, 203.0.113.7, 10.0.0.2")).toBe("203.0.113.7");
});
it("without a proxy, the single address Next recorded is used", async () => {
  expect(await ipWith("0", "127.0.0.1")).toBe("127.0.0.1");
});
it("says unknown when there is no header at all", async () => {
  applyTestEnv({ TRUSTED_PROXY_HOPS: "0" });
  const { clientIp } = await import("@/lib/server/client-ip");
  expect(clientIp(new Headers())).toBe("unknown");
});
