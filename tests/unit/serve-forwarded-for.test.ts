// The production server appends the connecting peer to X-Forwarded-For, as every proxy hop does
// (RFC 7239 §5.2 describes the same chain for the standard Forwarded header; X-Forwarded-For is the
// de-facto form of it — common practice). The client-address reader then believes only the right end.
import { describe, expect, it } from "vitest";
// @ts-expect-error — a plain .mjs script without type declarations
import { appendPeer } from "../../scripts/serve.mjs";
import { addressFromForwardedFor, proxyList } from "@/lib/client-address";

describe("appendPeer", () => {
  it("puts the peer last, after whatever the request carried", () => {
    expect(appendPeer(undefined, "192.0.2.10")).toBe("192.0.2.10");
    expect(appendPeer("203.0.113.5", "192.0.2.10")).toBe("203.0.113.5, 192.0.2.10");
    expect(appendPeer(["203.0.113.5", "198.51.100.1"], "192.0.2.10")).toBe("203.0.113.5, 198.51.100.1, 192.0.2.10");
    expect(appendPeer("  ", "192.0.2.10")).toBe("192.0.2.10");
    expect(appendPeer("203.0.113.5", undefined)).toBe("203.0.113.5");
    expect(appendPeer(undefined, undefined)).toBeUndefined();
  });

  it("a forged header cannot change the address a budget is counted against", () => {
    // a client talking to the app directly writes its own header: only the peer counts
    for (const forged of ["1.1.1.1", "10.0.0.1, 8.8.8.8", "not-an-address"]) {
      expect(addressFromForwardedFor(appendPeer(forged, "192.0.2.10"), null)).toBe("192.0.2.10");
    }
    // behind a trusted proxy (10.0.0.0/8) the proxy's own entry is the client's address
    const proxies = proxyList(["10.0.0.0/8"]);
    expect(addressFromForwardedFor(appendPeer("198.51.100.7", "10.1.2.3"), proxies)).toBe("198.51.100.7");
    // a client that forges a chain ending in a proxy address still only gets its own entry
    expect(addressFromForwardedFor(appendPeer("1.1.1.1, 10.9.9.9, 198.51.100.7", "10.1.2.3"), proxies)).toBe("198.51.100.7");
  });
});
