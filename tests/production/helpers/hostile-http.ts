// Raw HTTP for hostile requests: any bytes as the body, any Content-Type, with or without a
// Content-Length (chunked), so that the express layer and the body parsers see what an attacker
// could send. The public Host header is kept, as in ./http.ts.
import http from "node:http";
import { percentEncode } from "./hostile-values";
import { PUBLIC_HOST } from "./throwaway-stack";

export interface RawAnswer {
  status: number;
  headers: http.IncomingHttpHeaders;
  body: string;
}

export interface RawRequest {
  method: string;
  path: string;
  headers?: Record<string, string>;
  body?: Buffer;
  /** Stream the body without a Content-Length (Transfer-Encoding: chunked). */
  chunked?: boolean;
  timeoutMs?: number;
}

export function send(port: number, request: RawRequest): Promise<RawAnswer> {
  const headers: Record<string, string> = { Host: PUBLIC_HOST, ...request.headers };
  if (request.body && !request.chunked) headers["Content-Length"] = String(request.body.length);
  const timeoutMs = request.timeoutMs ?? 20_000;
  return new Promise((resolve, reject) => {
    let answered = false;
    const req = http.request({ host: "127.0.0.1", port, path: request.path, method: request.method, headers, agent: false }, (res) => {
      answered = true;
      const chunks: Buffer[] = [];
      res.on("data", (chunk: Buffer) => chunks.push(chunk));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks).toString("utf8") }));
      res.on("error", reject);
    });
    req.setTimeout(timeoutMs, () => req.destroy(new Error(`${request.method} ${request.path} gave no answer within ${timeoutMs} ms`)));
    // A server may answer (413) and close before a large body is written: the answer counts, the
    // broken pipe on our side does not.
    req.on("error", (error) => {
      if (!answered) reject(error);
    });
    if (!request.body) return req.end();
    if (!request.chunked) return req.end(request.body);
    const piece = 64 * 1024;
    for (let offset = 0; offset < request.body.length; offset += piece) req.write(request.body.subarray(offset, offset + piece));
    req.end();
  });
}

/** Form fields in order; a Buffer value is sent as those exact bytes (possibly not UTF-8). */
export type FormFields = [string, string | Buffer][];

export function urlEncoded(fields: FormFields): Buffer {
  const pairs = fields.map(([k, v]) => Buffer.concat([percentEncode(k), Buffer.from("="), percentEncode(v)]));
  return Buffer.concat(pairs.flatMap((pair, i) => (i === 0 ? [pair] : [Buffer.from("&"), pair])));
}

export interface FilePart {
  name: string;
  filename: string;
  type: string;
  bytes: Buffer;
}

/** A multipart/form-data body as a browser writes it. */
export function multipart(fields: FormFields, files: FilePart[] = []): { body: Buffer; contentType: string } {
  const boundary = `----hostile${Math.random().toString(16).slice(2)}`;
  const parts: Buffer[] = [];
  for (const [name, value] of fields) {
    const bytes = typeof value === "string" ? Buffer.from(value, "utf8") : value;
    parts.push(Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="${name}"\r\n\r\n`), bytes, Buffer.from("\r\n"));
  }
  for (const file of files) {
    parts.push(
      Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="${file.name}"; filename="${file.filename}"\r\nContent-Type: ${file.type}\r\n\r\n`),
      file.bytes,
      Buffer.from("\r\n"),
    );
  }
  parts.push(Buffer.from(`--${boundary}--\r\n`));
  return { body: Buffer.concat(parts), contentType: `multipart/form-data; boundary=${boundary}` };
}

/** The `name=value` pairs of a response's Set-Cookie lines, for a Cookie header. */
export function cookieOf(answer: RawAnswer) {
  return (answer.headers["set-cookie"] ?? []).map((line) => line.split(";")[0]).join("; ");
}
