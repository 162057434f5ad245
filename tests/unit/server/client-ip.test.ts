import { describe, expect, it } from "vitest";
import { CLIENT_IP_HEADER, clientIp, normaliseIp } from "~/server/client-ip.server";
import { trustProxySetting } from "../../../scripts/lib/request-guards";

describe("client address", () => {
  it("reads only the header the production server sets", () => {
    const request = (headers: Record<string, string>) => new Request("http://app.test/", { headers });
    expect(clientIp(request({ [CLIENT_IP_HEADER]: "203.0.113.9" }))).toBe("203.0.113.9");
    expect(clientIp(request({ "X-Forwarded-For": "203.0.113.9" }))).toBeNull();
  });

  it("treats an IPv4-mapped address as IPv4 and an IPv6 address as its /64", () => {
    expect(normaliseIp("::ffff:198.51.100.4")).toBe("198.51.100.4");
    expect(normaliseIp("2001:db8:1:2:aaaa::1")).toBe("2001:0db8:0001:0002::/64");
    expect(normaliseIp("2001:db8:1:2:bbbb:cccc:dddd:eeee")).toBe("2001:0db8:0001:0002::/64");
    expect(normaliseIp("::1")).toBe("0000:0000:0000:0000::/64");
    expect(normaliseIp("not-an-address")).toBeNull();
  });

  it("counts TRUST_PROXY as proxy hops, never as 'trust everything'", () => {
    expect(trustProxySetting(undefined)).toBe(false);
    expect(trustProxySetting("0")).toBe(false);
    expect(trustProxySetting("1")).toBe(1);
    expect(trustProxySetting("2")).toBe(2);
    expect(trustProxySetting("true")).toBe(false);
  });
});
