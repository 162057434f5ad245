// JSON API over the received mail, read server-side by the app's development outbox page
// and by tests.
import { createServer, type IncomingMessage, type Server, type ServerResponse } from "node:http";
import { matchPath, sendJson } from "./http-helpers.ts";
import type { MailStore } from "./mail-store.ts";

export function createMailHttpServer(store: MailStore): Server {
  return createServer((req, res) => {
    try {
      route(store, req, res);
    } catch (error) {
      sendJson(res, 500, { error: { message: (error as Error).message } });
    }
  });
}

function route(store: MailStore, req: IncomingMessage, res: ServerResponse): void {
  const url = new URL(req.url ?? "/", "http://localhost");
  const method = req.method ?? "GET";
  // The body of a DELETE is never read; resume() lets the request finish either way.
  req.resume();

  if (method === "GET" && url.pathname === "/healthz") {
    return sendJson(res, 200, { ok: true });
  }
  if (matchPath("/messages", url.pathname)) {
    if (method === "GET") {
      const to = url.searchParams.get("to") ?? undefined;
      const messages = store.list({ to });
      return sendJson(res, 200, { count: messages.length, messages });
    }
    if (method === "DELETE") {
      store.clear();
      return sendJson(res, 200, { deleted: true });
    }
    return sendJson(res, 405, { error: { message: `${method} not allowed on /messages` } });
  }
  const one = matchPath("/messages/:id", url.pathname);
  if (one && method === "GET") {
    const mail = store.get(one.id!);
    if (!mail) return sendJson(res, 404, { error: { message: `No message ${one.id}` } });
    return sendJson(res, 200, mail);
  }
  sendJson(res, 404, { error: { message: `No route ${method} ${url.pathname}` } });
}
