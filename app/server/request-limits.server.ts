// Checks on every request body and address before any loader or action sees it, so that a
// hand-made request meets a clear 4xx instead of a crash or a hung server. The production server
// wraps every route with this (scripts/serve.ts), as it does for database outages.
// - A body of a form or JSON is at most MAX_BODY_BYTES: the largest real one is a field reading
//   with its 5 MB photo.
// - A form field name addresses list positions up to MAX_LIST_INDEX and nests at most
//   MAX_NAME_DEPTH levels: Conform builds the submitted value from the names, so `x[99999999]=1`
//   makes a 100-million-slot array (seconds to copy, hundreds of MB to send back to the page) and
//   `a.a.a…` 10 000 levels deep overflows the stack.
// - Text holds no NUL (PostgreSQL text cannot store U+0000) and, in JSON, no unpaired surrogate
//   (app/lib/text-checks.ts).
import { jsonTextProblem, textProblem } from "~/lib/text-checks";

export const MAX_BODY_BYTES = 8 * 1024 * 1024;
export const MAX_LIST_INDEX = 10_000;
export const MAX_NAME_DEPTH = 32;

const FORM_TYPES = /^(application\/x-www-form-urlencoded|multipart\/form-data)/i;

/** Why the request's address is refused (a NUL in the path or query), or null. */
export function addressProblem(url: URL): string | null {
  const decoded = (text: string) => {
    try {
      return decodeURIComponent(text);
    } catch {
      return text;
    }
  };
  if (decoded(url.pathname).includes("\0")) return "The address contains a NUL character (%00).";
  for (const [name, value] of url.searchParams)
    if (`${name}${value}`.includes("\0")) return `The query parameter "${name.slice(0, 40)}" contains a NUL character.`;
  return null;
}

export function fieldNameProblem(name: string): string | null {
  const segments = name.split(/[.[]/).length;
  if (segments > MAX_NAME_DEPTH) return `The form field name "${name.slice(0, 40)}…" nests ${segments} levels; at most ${MAX_NAME_DEPTH} are accepted.`;
  for (const match of name.matchAll(/\[(\d+)\]/g)) {
    if (Number(match[1]) > MAX_LIST_INDEX)
      return `The form field "${name.slice(0, 60)}" names list position ${match[1].slice(0, 20)}; lists here hold at most ${MAX_LIST_INDEX} entries.`;
  }
  return null;
}

/** Form fields: names within the limits, text values without NUL. Files are bytes and may hold anything. */
export function formProblem(entries: Iterable<[string, FormDataEntryValue]>): string | null {
  for (const [name, value] of entries) {
    const problem = fieldNameProblem(name) ?? textProblem(`The form field name "${name.slice(0, 40)}"`, name);
    if (problem) return problem;
    if (typeof value === "string") {
      const inValue = textProblem(`The form field "${name.slice(0, 40)}"`, value);
      if (inValue) return inValue;
    }
  }
  return null;
}

/**
 * Reads and discards the rest of a body that is being refused, so that the refusal reaches the
 * client: a server that answers and closes while the client is still sending makes the client's
 * socket reset, and the answer is lost with it. Beyond DRAIN_LIMIT_BYTES the connection is dropped.
 */
export const DRAIN_LIMIT_BYTES = 4 * MAX_BODY_BYTES;

export async function drainBody(reader: ReadableStreamDefaultReader<Uint8Array>, alreadyRead = 0) {
  let total = alreadyRead;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) return;
    total += value.byteLength;
    if (total > DRAIN_LIMIT_BYTES) return void reader.cancel().catch(() => {});
  }
}

/** A copy of the body, at most `max` bytes; null (and the body drained) when it is larger. */
async function readCopy(request: Request, max: number): Promise<Buffer | null> {
  const declared = Number(request.headers.get("Content-Length") ?? "");
  if (Number.isFinite(declared) && declared > max) {
    if (request.body) await drainBody(request.body.getReader());
    return null;
  }
  const copy = request.clone().body;
  if (!copy || !request.body) return Buffer.alloc(0);
  const reader = copy.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) return Buffer.concat(chunks);
    total += value.byteLength;
    if (total > max) {
      // Not awaited: cancelling one branch of a tee settles only once the other is cancelled too.
      reader.cancel().catch(() => {});
      await drainBody(request.body.getReader());
      return null;
    }
    chunks.push(value);
  }
}

/** Why the request's body is refused, with the status to answer, or null when it may pass. */
export async function bodyProblem(request: Request): Promise<{ status: 400 | 413; message: string } | null> {
  const type = request.headers.get("Content-Type") ?? "";
  const isForm = FORM_TYPES.test(type);
  const isJson = /^application\/json/i.test(type);
  if (!isForm && !isJson) return null;
  const bytes = await readCopy(request, MAX_BODY_BYTES);
  if (!bytes) return { status: 413, message: `The request body is larger than ${MAX_BODY_BYTES / 1024 / 1024} MB; nothing was saved.` };
  let problem: string | null = null;
  try {
    if (isJson) problem = jsonTextProblem(JSON.parse(bytes.toString("utf8")), "A text in the JSON body");
    else
      problem = formProblem(
        await new Request("http://body.invalid/", { method: "POST", headers: { "Content-Type": type }, body: new Uint8Array(bytes) }).formData(),
      );
  } catch {
    // Not JSON, or a broken multipart body: the route's own parser answers that with its 4xx.
    return null;
  }
  return problem ? { status: 400, message: problem } : null;
}

/** JSON under /api/, a page's error (the root ErrorBoundary shows the message) elsewhere. */
function refusal(status: 400 | 413, message: string, url: URL) {
  const headers = { "Cache-Control": "no-store" };
  if (url.pathname.startsWith("/api/")) return Response.json({ error: { message } }, { status, headers });
  return new Response(message, { status, statusText: status === 413 ? "Payload Too Large" : "Bad Request", headers });
}

type Handler = (args: { request: Request }) => unknown;
interface RouteEntry {
  module: object;
  path?: string;
}

/** A read-only API endpoint asked to change something: JSON like every other API answer. */
function readOnlyEndpoint() {
  return Response.json({ error: { message: "This endpoint only reads: use GET." } }, { status: 405, headers: { Allow: "GET, HEAD" } });
}

/**
 * A copy of the server build whose loaders and actions refuse requests that break the limits above,
 * and whose read-only API endpoints answer other methods with a JSON 405.
 */
export function withRequestLimits<Build extends { routes: Record<string, RouteEntry | undefined> }>(build: Build): Build {
  const guard = (handler: Handler, checkBody: boolean): Handler =>
    async function limited(args) {
      const url = new URL(args.request.url);
      const address = addressProblem(url);
      if (address) throw refusal(400, address, url);
      const body = checkBody ? await bodyProblem(args.request) : null;
      if (body) throw refusal(body.status, body.message, url);
      return handler(args);
    };
  const routes = Object.fromEntries(
    Object.entries(build.routes).map(([id, route]) => {
      if (!route) return [id, route];
      const module: Record<string, unknown> = { ...route.module };
      if (typeof module.loader === "function") module.loader = guard(module.loader as Handler, false);
      if (typeof module.action === "function") module.action = guard(module.action as Handler, true);
      // Without an action React Router answers a POST to a resource route with its own 405 body
      // ("Unexpected Server Error"); API clients get the API's JSON error instead.
      else if (route.path?.startsWith("api/v1/") && typeof module.loader === "function") module.action = readOnlyEndpoint;
      return [id, { ...route, module }];
    }),
  );
  return { ...build, routes };
}
