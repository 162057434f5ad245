// Calls route modules' loaders and actions in-process, as the server would, keeping cookies between
// calls like a browser. The database, better-auth and the mail fake are real.
export const BASE = process.env.PUBLIC_URL ?? "http://127.0.0.1:3999";

// Route modules are typed per route; here any loader or action will do.
type Handler = (args: any) => unknown;
interface RouteModule {
  loader?: Handler;
  action?: Handler;
}

export interface RouteResult {
  status: number;
  headers: Headers;
  data: any;
  location: string | null;
}

export function isDataWithInit(value: unknown): value is { data: unknown; init: ResponseInit | null } {
  return typeof value === "object" && value !== null && (value as { type?: string }).type === "DataWithResponseInit";
}

/** A handler's returned or thrown value as the server would send it. */
export async function toResult(value: unknown): Promise<RouteResult> {
  if (value instanceof Response) {
    const text = await value.text();
    let data: unknown = text;
    try {
      data = JSON.parse(text);
    } catch {}
    return { status: value.status, headers: value.headers, data, location: value.headers.get("Location") };
  }
  if (isDataWithInit(value)) {
    const headers = new Headers(value.init?.headers);
    return { status: value.init?.status ?? 200, headers, data: value.data, location: headers.get("Location") };
  }
  return { status: 200, headers: new Headers(), data: value, location: null };
}

export class RouteClient {
  private cookies = new Map<string, string>();

  cookieHeader() {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
  }

  private keepCookies(headers: Headers) {
    for (const line of headers.getSetCookie()) {
      const [pair, ...attrs] = line.split(";");
      const eq = pair.indexOf("=");
      const name = pair.slice(0, eq).trim();
      const value = pair.slice(eq + 1).trim();
      const expired = attrs.some((a) => /max-age=0/i.test(a.trim())) || value === "";
      if (expired) this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
  }

  request(path: string, init: { method?: string; form?: Record<string, string>; headers?: Record<string, string> } = {}) {
    const headers = new Headers(init.headers);
    if (this.cookies.size) headers.set("Cookie", this.cookieHeader());
    headers.set("Origin", BASE);
    const body = init.form ? new URLSearchParams(init.form) : undefined;
    return new Request(new URL(path, BASE), { method: init.method ?? (body ? "POST" : "GET"), headers, body });
  }

  async loader(mod: RouteModule, path: string, params: Record<string, string> = {}) {
    return this.run(mod.loader!, this.request(path), params);
  }

  async action(mod: RouteModule, path: string, form: Record<string, string>, params: Record<string, string> = {}) {
    return this.run(mod.action!, this.request(path, { form }), params);
  }

  private async run(handler: Handler, request: Request, params: Record<string, string>) {
    let outcome: unknown;
    try {
      outcome = await handler({ request, params, context: {}, url: new URL(request.url), pattern: "" });
    } catch (thrown) {
      if (!(thrown instanceof Response) && !isDataWithInit(thrown)) throw thrown;
      outcome = thrown;
    }
    const result = await toResult(outcome);
    this.keepCookies(result.headers);
    return result;
  }
}

let counter = 0;
/** A unique address per call, so test files never collide on the shared database. */
export function uniqueEmail(label: string) {
  counter += 1;
  return `${label}-${Date.now().toString(36)}-${counter}@test.example`;
}
