// Which address a request came from, for rate limits and the sign-in log. Plain functions (no
// `server-only`) so tests call them directly.
import { BlockList, isIP } from "node:net";
import { trustedProxies } from "./env";

/** A BlockList of the given addresses and CIDR ranges; throws naming the first entry that is neither. */
export function proxyList(entries: string[]): BlockList {
  const list = new BlockList();
  for (const entry of entries) {
    const [address, prefix, extra] = entry.split("/");
    const family = isIP(address);
    const bits = prefix === undefined ? undefined : Number(prefix);
    const maxBits = family === 6 ? 128 : 32;
    if (!family || extra !== undefined || (bits !== undefined && (!/^\d+$/.test(prefix) || bits > maxBits))) {
      throw new Error(`TRUSTED_PROXIES: "${entry}" is not an IP address or a CIDR range (e.g. 10.0.0.0/8).`);
    }
    const type = family === 6 ? "ipv6" : "ipv4";
    if (bits === undefined) list.addAddress(address, type);
    else list.addSubnet(address, bits, type);
  }
  return list;
}

/** "::ffff:192.0.2.1" and "192.0.2.1" are one client; ports and brackets are not part of the address. */
function normalize(entry: string): string {
  let a = entry.trim().toLowerCase();
  const bracketed = /^\[([^\]]+)\](?::\d+)?$/.exec(a);
  if (bracketed) a = bracketed[1];
  else if (/^\d{1,3}(\.\d{1,3}){3}:\d+$/.test(a)) a = a.slice(0, a.lastIndexOf(":"));
  if (a.startsWith("::ffff:") && isIP(a.slice(7)) === 4) a = a.slice(7);
  return a;
}

function isTrusted(list: BlockList, address: string): boolean {
  const family = isIP(address);
  return family !== 0 && list.check(address, family === 6 ? "ipv6" : "ipv4");
}

/**
 * The client address from an X-Forwarded-For chain. Every hop appends the address it received the
 * request from, so only the right end is written by someone we know: without trusted proxies the
 * last entry is the client (the leftmost ones are whatever the client sent); with them, the chain
 * is walked from the right past the trusted proxies, and the first other entry is the client.
 * Null when there is no usable entry.
 */
export function addressFromForwardedFor(header: string | null, proxies: BlockList | null): string | null {
  const hops = (header ?? "").split(",").map(normalize).filter(Boolean);
  if (hops.length === 0) return null;
  if (!proxies) return isIP(hops[hops.length - 1]) ? hops[hops.length - 1] : null;
  for (let i = hops.length - 1; i >= 0; i--) {
    if (!isIP(hops[i])) return null; // garbage in the chain: nothing to the left of it can be believed
    if (!isTrusted(proxies, hops[i])) return hops[i];
  }
  // every hop is a proxy of ours: the request started at the leftmost one
  return hops[0];
}

let cached: { key: string; list: BlockList | null } | undefined;

/** TRUSTED_PROXIES as a list (null when unset), parsed once per value. */
export function configuredProxies(): BlockList | null {
  const entries = trustedProxies();
  const key = entries.join(",");
  if (cached?.key !== key) cached = { key, list: entries.length ? proxyList(entries) : null };
  return cached.list;
}

/** The request's client address as TRUSTED_PROXIES says to read it, or "local" when there is none. */
export function clientAddress(req: Request | Headers): string {
  const headers = req instanceof Headers ? req : req.headers;
  return addressFromForwardedFor(headers.get("x-forwarded-for"), configuredProxies()) ?? "local";
}

/**
 * A copy of the headers whose X-Forwarded-For holds only the resolved client address, for code
 * that reads the header its own way (better-auth believes a single-entry header as it stands).
 */
export function withClientAddress(headers: Headers): Headers {
  const out = new Headers(headers);
  const address = addressFromForwardedFor(headers.get("x-forwarded-for"), configuredProxies());
  if (address) out.set("x-forwarded-for", address);
  else out.delete("x-forwarded-for");
  return out;
}
