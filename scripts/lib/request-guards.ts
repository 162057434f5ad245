// Express middleware of the production server that runs before any route: the client's address for
// rate limits, and refusal of cross-site writes (app/server/cross-origin.server.ts decides).
import type { NextFunction, Request, Response } from "express";
import { CLIENT_IP_HEADER } from "../../app/server/client-ip.server";
import { crossOriginRefusal } from "../../app/server/cross-origin.server";

/**
 * TRUST_PROXY is the number of proxies in front of the app (0: none). Express then takes the client
 * address that many hops from the right of X-Forwarded-For, the part our own proxies wrote; a count
 * rather than `true`, which would believe the left-most entry, one the client can write itself.
 */
export function trustProxySetting(value: string | undefined): number | false {
  const hops = Number(value ?? "0");
  return Number.isInteger(hops) && hops > 0 ? hops : false;
}

/** Replaces whatever the client sent in this header with the address Express worked out. */
export function clientIpHeader(req: Request, _res: Response, next: NextFunction) {
  req.headers[CLIENT_IP_HEADER] = req.ip ?? req.socket.remoteAddress ?? "";
  next();
}

export function refuseCrossOriginWrites(publicUrl: string) {
  const publicOrigin = new URL(publicUrl).origin;
  return function crossOriginGuard(req: Request, res: Response, next: NextFunction) {
    const reason = crossOriginRefusal(
      { method: req.method, path: req.path, origin: req.get("Origin"), referer: req.get("Referer"), authorization: req.get("Authorization") },
      publicUrl,
    );
    if (!reason) return next();
    if (req.path.startsWith("/api/")) return res.status(403).json({ error: { message: reason } });
    res.status(403).type("text/plain").send(`Kitwright refused this request. ${reason} Open Kitwright at ${publicOrigin}/ and try again.`);
  };
}
