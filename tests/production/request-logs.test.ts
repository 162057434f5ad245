// The production server's request log (scripts/serve.ts, LOG_LEVEL=info): one JSON line per request
// with the id that the response carries in X-Request-Id, and never a secret — not the password of a
// sign-in (form or JSON), not a team API key, not the session cookie, not a reset token in the query
// string, not the Stripe keys from the environment.
import { randomBytes } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { call, cookiesOf, type CallOptions, type HttpAnswer } from "./helpers/http";
import { PUBLIC_HOST, PUBLIC_URL, startThrowawayStack, type AppInstance } from "./helpers/throwaway-stack";

const secrets = {
  password: `pw-${randomBytes(9).toString("hex")}`,
  wrongPassword: `wrong-${randomBytes(9).toString("hex")}`,
  stripeKey: `sk_test_logcheck_${randomBytes(12).toString("hex")}`,
  webhookSecret: `whsec_logcheck_${randomBytes(12).toString("hex")}`,
  resetToken: `reset${randomBytes(12).toString("hex")}`,
};
const email = `logs-${randomBytes(4).toString("hex")}@test.example`;

let stack: Awaited<ReturnType<typeof startThrowawayStack>>;
let instance: AppInstance;
const answers: { label: string; answer: HttpAnswer }[] = [];

async function send(label: string, path: string, options: CallOptions = {}) {
  const headers = options.method === "POST" || options.form || options.json !== undefined ? { Origin: PUBLIC_URL, ...options.headers } : options.headers;
  const answer = await call(instance.port, PUBLIC_HOST, path, { ...options, headers });
  answers.push({ label, answer });
  return answer;
}

interface LogLine {
  level: string;
  msg: string;
  id?: string;
  method?: string;
  path?: string;
  status?: number;
  ms?: number;
  time: string;
}

beforeAll(async () => {
  stack = await startThrowawayStack(1, { env: { LOG_LEVEL: "info", STRIPE_SECRET_KEY: secrets.stripeKey, STRIPE_WEBHOOK_SECRET: secrets.webhookSecret } });
  instance = stack.instances[0];
}, 120_000);

afterAll(async () => {
  await stack?.stop();
});

describe("request logs", () => {
  it("give every request one JSON line with the id echoed in X-Request-Id, and never a password, key, cookie or token", async () => {
    const signUp = await send("sign-up", "/sign-up", { form: { name: "Log Reader", email, password: secrets.password } });
    expect(signUp.status).toBe(302);
    const firstCookie = cookiesOf(signUp);
    expect(
      (await send("name a team", "/team/new", { form: { name: `Log Team ${randomBytes(3).toString("hex")}` }, headers: { Cookie: firstCookie } })).status,
    ).toBe(302);
    const created = await send("create an API key", "/team/api-keys", { form: { intent: "create", name: "Log check" }, headers: { Cookie: firstCookie } });
    const apiKey = created.body.match(/kw_[A-Za-z0-9_-]{30,}/)?.[0];
    expect(apiKey, `no key in the answer (${created.status})`).toBeDefined();

    const signIn = await send("sign-in (form)", "/sign-in", { form: { email, password: secrets.password } });
    expect(signIn.status).toBe(302);
    const cookie = cookiesOf(signIn);
    const jsonSignIn = await send("sign-in (JSON API)", "/api/auth/sign-in/email", { json: { email, password: secrets.password } });
    expect(jsonSignIn.status).toBe(200);
    expect((await send("page with the session", "/team", { headers: { Cookie: cookie } })).status).toBe(200);
    expect((await send("API with the key", "/api/v1/me", { headers: { Authorization: `Bearer ${apiKey}` } })).status).toBe(200);
    // Failing requests: a bad body, a wrong password, an unknown page, a refused cross-site write.
    expect((await send("API bad body", "/api/v1/sites", { json: {}, headers: { Authorization: `Bearer ${apiKey}` } })).status).toBe(400);
    expect((await send("wrong password", "/sign-in", { form: { email, password: secrets.wrongPassword } })).status).toBe(401);
    expect((await send("unknown page", "/no-such-page", { headers: { Cookie: cookie } })).status).toBe(404);
    expect((await send("cross-site write", "/sign-out", { form: {}, headers: { Origin: "https://elsewhere.example", Cookie: cookie } })).status).toBe(403);
    expect((await send("reset link", `/reset-password?token=${secrets.resetToken}`)).status).toBe(200);
    const ownId = `client-${randomBytes(8).toString("hex")}`;
    expect((await send("caller's own id", "/healthz", { headers: { "X-Request-Id": ownId } })).headers["x-request-id"]).toBe(ownId);
    const forged = await send("unusable id", "/healthz", { headers: { "X-Request-Id": "bad id\twith spaces" } });

    // The line is written when the response finishes, which can be a moment after the client has it.
    const requestLines = () =>
      instance.stdout
        .join("")
        .split("\n")
        .filter((line) => line.trim())
        .map((line) => JSON.parse(line) as LogLine)
        .filter((line) => line.msg === "request");
    const ids = answers.map(({ answer }) => answer.headers["x-request-id"]);
    for (let i = 0; i < 50 && !ids.every((id) => requestLines().some((line) => line.id === id)); i++) await new Promise((r) => setTimeout(r, 50));

    // Every request line (the harness's own health checks at start-up included) is complete.
    const lines = requestLines();
    for (const line of lines) {
      expect(line.id).toMatch(/^[\w-]{8,64}$/);
      expect([line.method, typeof line.path, typeof line.status, typeof line.ms, Number.isNaN(Date.parse(line.time))]).toEqual([
        expect.stringMatching(/^[A-Z]+$/),
        "string",
        "number",
        "number",
        false,
      ]);
    }
    for (const { label, answer } of answers) {
      const id = answer.headers["x-request-id"];
      expect(id, label).toMatch(/^[\w-]{8,64}$/);
      const mine = lines.filter((line) => line.id === id);
      expect(mine, `${label}: one log line with id ${id}`).toHaveLength(1);
      expect(mine[0].status, label).toBe(answer.status);
      expect(mine[0].level, label).toBe(answer.status >= 500 ? "error" : answer.status >= 400 ? "warn" : "info");
      expect(typeof mine[0].ms, label).toBe("number");
    }
    expect(new Set(lines.map((line) => line.id)).size).toBe(lines.length);
    expect(forged.headers["x-request-id"]).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/);
    expect(lines.find((line) => line.id === ownId)?.path).toBe("/healthz");
    expect(lines.find((line) => line.id === answers.find((a) => a.label === "reset link")!.answer.headers["x-request-id"])?.path).toBe("/reset-password");

    const sessionOf = (cookies: string) => decodeURIComponent(cookies.match(/better-auth\.session_token=([^;]+)/)![1]);
    const sessions = [sessionOf(cookie), sessionOf(firstCookie), sessionOf(cookiesOf(jsonSignIn))];
    const everything = instance.output.join("");
    const forbidden = {
      ...secrets,
      apiKey: apiKey!,
      ...Object.fromEntries(
        sessions.flatMap((value, i) => [
          [`sessionCookie${i}`, value],
          [`sessionToken${i}`, value.split(".")[0]],
        ]),
      ),
    };
    const found = Object.entries(forbidden).filter(([, value]) => everything.includes(value) || everything.includes(encodeURIComponent(value)));
    expect(found.map(([name]) => name)).toEqual([]);
  });
});
