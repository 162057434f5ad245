// Small node:http plumbing shared by the mail and payments fakes. No framework: the fakes
// must start in well under a second from `tsx` and have nothing to configure.
import type { IncomingMessage, Server, ServerResponse } from "node:http";
import type { Server as NetServer } from "node:net";
import { realpathSync } from "node:fs";
import { fileURLToPath } from "node:url";

export const LOOPBACK = "127.0.0.1";

export class BodyTooLargeError extends Error {}

export function readBody(req: IncomingMessage, limitBytes = 1_000_000): Promise<string> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    let size = 0;
    req.on("data", (chunk: Buffer) => {
      size += chunk.length;
      // Keep draining instead of destroying the socket so the client still gets our 4xx.
      if (size <= limitBytes) chunks.push(chunk);
    });
    req.on("end", () => {
      if (size > limitBytes) reject(new BodyTooLargeError(`Request body over ${limitBytes} bytes`));
      else resolve(Buffer.concat(chunks).toString("utf8"));
    });
    req.on("error", reject);
  });
}

export function sendJson(res: ServerResponse, status: number, body: unknown, headers: Record<string, string> = {}): void {
  const text = JSON.stringify(body, null, 2);
  res.writeHead(status, {
    "Content-Type": "application/json; charset=utf-8",
    "Cache-Control": "no-store",
    ...headers,
  });
  res.end(text);
}

export function sendHtml(res: ServerResponse, status: number, html: string): void {
  res.writeHead(status, { "Content-Type": "text/html; charset=utf-8", "Cache-Control": "no-store" });
  res.end(html);
}

export function redirect(res: ServerResponse, location: string): void {
  // 303 so the browser follows a form POST with a GET.
  res.writeHead(303, { Location: location });
  res.end();
}

/** Matches "/v1/checkout/sessions/:id" style patterns; returns the params or null. */
export function matchPath(pattern: string, pathname: string): Record<string, string> | null {
  const want = pattern.split("/");
  const got = pathname.replace(/\/+$/, "").split("/");
  if (want.length !== got.length) return null;
  const params: Record<string, string> = {};
  for (let i = 0; i < want.length; i++) {
    const w = want[i]!;
    const g = got[i]!;
    if (w.startsWith(":")) {
      if (!g) return null;
      params[w.slice(1)] = safeDecode(g);
    } else if (w !== g) {
      return null;
    }
  }
  return params;
}

function safeDecode(segment: string): string {
  try {
    return decodeURIComponent(segment);
  } catch {
    return segment;
  }
}

/** Listens on loopback; port 0 picks a free port, which is what tests use. */
export function listen(server: NetServer, port: number): Promise<number> {
  return new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, LOOPBACK, () => {
      server.off("error", reject);
      const address = server.address();
      resolve(typeof address === "object" && address ? address.port : port);
    });
  });
}

export function closeHttpServer(server: Server): Promise<void> {
  return new Promise((resolve) => {
    if (!server.listening) return resolve();
    server.close(() => resolve());
    // Keep-alive sockets (fetch, the Stripe SDK) would otherwise hold close() open.
    server.closeAllConnections();
  });
}

/** True when this module is the script tsx/node was started with (the CLI entry). */
export function isMainModule(moduleUrl: string): boolean {
  const entry = process.argv[1];
  if (!entry) return false;
  try {
    return realpathSync(entry) === realpathSync(fileURLToPath(moduleUrl));
  } catch {
    return false;
  }
}

/** Stops cleanly on SIGINT/SIGTERM; a second signal exits at once. */
export function stopOnSignals(name: string, close: () => Promise<void>): void {
  let stopping = false;
  function onSignal(signal: NodeJS.Signals): void {
    if (stopping) process.exit(1);
    stopping = true;
    console.log(`${name}: ${signal}, stopping`);
    close().then(
      () => process.exit(0),
      (error: unknown) => {
        console.error(`${name}: error while stopping`, error);
        process.exit(1);
      },
    );
  }
  process.on("SIGINT", onSignal);
  process.on("SIGTERM", onSignal);
}
