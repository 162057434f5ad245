// Reads a JSON request body with a size limit; a malformed or oversized body is a 4xx, never a 5xx.
import { drainBody } from "./request-limits.server";

export const MAX_JSON_BYTES = 256 * 1024;

export function jsonError(status: number, message: string, fields?: Record<string, string>) {
  return Response.json({ error: fields ? { message, fields } : { message } }, { status });
}

export async function readJsonBody(request: Request): Promise<unknown> {
  const type = request.headers.get("Content-Type") ?? "";
  if (!type.includes("application/json")) throw jsonError(415, "Send the body as JSON (Content-Type: application/json).");
  const declared = Number(request.headers.get("Content-Length") ?? 0);
  if (declared > MAX_JSON_BYTES) {
    // Read and thrown away, so that the 413 reaches a client still sending (drainBody).
    if (request.body) await drainBody(request.body.getReader());
    throw jsonError(413, `The body is larger than ${MAX_JSON_BYTES / 1024} KiB.`);
  }
  const text = await request.text();
  if (text.length > MAX_JSON_BYTES) throw jsonError(413, `The body is larger than ${MAX_JSON_BYTES / 1024} KiB.`);
  try {
    return JSON.parse(text);
  } catch {
    throw jsonError(400, "The body is not valid JSON.");
  }
}
