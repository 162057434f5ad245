// The client's address as the production server saw it. scripts/serve.ts writes it into this header
// on every request, replacing anything the client sent, after applying TRUST_PROXY (the address the
// nearest trusted proxy put into X-Forwarded-For, or the socket's peer). Rate limits and better-auth
// (advanced.ipAddress.ipAddressHeaders) read only this header, never X-Forwarded-For itself.
import { isIPv4, isIPv6 } from "node:net";

export const CLIENT_IP_HEADER = "x-kitwright-client-ip";

/** The address to count attempts against, or null when unknown (the dev server sets no header). */
export function clientIp(request: Request): string | null {
  const value = request.headers.get(CLIENT_IP_HEADER)?.trim();
  return value ? normaliseIp(value) : null;
}

/**
 * IPv4-mapped IPv6 (::ffff:203.0.113.9) becomes plain IPv4; other IPv6 addresses collapse to their
 * /64, the block one subscriber usually holds, so rotating through it does not reset a limit.
 */
export function normaliseIp(ip: string): string | null {
  const mapped = ip.toLowerCase().match(/^::ffff:(\d+\.\d+\.\d+\.\d+)$/);
  if (mapped && isIPv4(mapped[1])) return mapped[1];
  if (isIPv4(ip)) return ip;
  if (!isIPv6(ip)) return null;
  return `${expandIpv6(ip).slice(0, 4).join(":")}::/64`;
}

function expandIpv6(ip: string): string[] {
  const [head, tail = ""] = ip.toLowerCase().split("::");
  const left = head ? head.split(":") : [];
  const right = ip.includes("::") && tail ? tail.split(":") : [];
  const zeros = ip.includes("::") ? Array(8 - left.length - right.length).fill("0") : [];
  return [...left, ...zeros, ...right].map((group) => group.padStart(4, "0"));
}
