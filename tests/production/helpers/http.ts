// Plain HTTP to one app instance, as a load balancer would forward it: the public Host header is
// kept, whichever instance answers. (fetch() cannot set Host; node:http can.)
import http from "node:http";

export interface HttpAnswer {
  status: number;
  headers: http.IncomingHttpHeaders;
  body: string;
  ms: number;
}

export interface CallOptions {
  method?: string;
  headers?: Record<string, string>;
  form?: Record<string, string>;
  json?: unknown;
  /** A request that takes longer fails the test: the server must answer fast, never hang. */
  timeoutMs?: number;
}

export function call(port: number, host: string, path: string, options: CallOptions = {}): Promise<HttpAnswer> {
  const body = options.form ? new URLSearchParams(options.form).toString() : options.json !== undefined ? JSON.stringify(options.json) : undefined;
  const headers: Record<string, string> = { Host: host, ...options.headers };
  if (options.form) headers["Content-Type"] = "application/x-www-form-urlencoded";
  if (options.json !== undefined) headers["Content-Type"] = "application/json";
  if (body !== undefined) headers["Content-Length"] = String(Buffer.byteLength(body));
  const started = performance.now();
  const timeoutMs = options.timeoutMs ?? 5000;
  return new Promise((resolve, reject) => {
    const req = http.request(
      { host: "127.0.0.1", port, path, method: options.method ?? (body !== undefined ? "POST" : "GET"), headers, agent: false },
      (res) => {
        const chunks: Buffer[] = [];
        res.on("data", (chunk: Buffer) => chunks.push(chunk));
        res.on("end", () =>
          resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks).toString("utf8"), ms: performance.now() - started }),
        );
        res.on("error", reject);
      },
    );
    req.setTimeout(timeoutMs, () => req.destroy(new Error(`${options.method ?? "GET"} ${path} on :${port} gave no answer within ${timeoutMs} ms`)));
    req.on("error", reject);
    req.end(body);
  });
}

/** The `name=value` pairs of a response's Set-Cookie lines, ready for a Cookie header. */
export function cookiesOf(answer: HttpAnswer) {
  return (answer.headers["set-cookie"] ?? []).map((line) => line.split(";")[0]).join("; ");
}
