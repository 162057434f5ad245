// The checks the production server runs before any route (app/server/request-limits.server.ts):
// list positions and nesting of form field names, NUL and unpaired surrogates, body size.
import { describe, expect, it } from "vitest";
import { addressProblem, bodyProblem, fieldNameProblem, formProblem, MAX_BODY_BYTES } from "~/server/request-limits.server";
import { jsonTextProblem, textProblem } from "~/lib/text-checks";

function post(body: string | Uint8Array, type: string, headers: Record<string, string> = {}) {
  return new Request("http://app.test/sites/new", { method: "POST", headers: { "Content-Type": type, ...headers }, body: body as BodyInit });
}

describe("form field names", () => {
  it("accept the names the app's forms use", () => {
    for (const name of ["email", "months[11].tMaxC", "lines[199].quantity", "priceBreaks[0].unitPrice", "design.lossesPct.soiling"])
      expect(fieldNameProblem(name)).toBeNull();
  });

  it("refuse list positions above 10 000 and names nested deeper than 32 levels", () => {
    expect(fieldNameProblem("junk[99999999]")).toMatch(/list position 99999999/);
    expect(fieldNameProblem(Array(10_000).fill("a").join("."))).toMatch(/nests 10000 levels/);
  });
});

describe("text that cannot be stored", () => {
  it("names NUL and unpaired surrogates, and lets paired ones (emoji) and other odd text pass", () => {
    expect(textProblem("The name", "Ridge\u0000hut")).toMatch(/NUL character/);
    expect(textProblem("The name", "Ridge \uD800 hut")).toMatch(/unpaired surrogate/);
    expect(textProblem("The name", "hut \uDC00")).toMatch(/unpaired surrogate/);
    expect(textProblem("The name", "🔋⚡ \u202Egnp.exe \u200B '; DROP TABLE site; --")).toBeNull();
  });

  it("walks JSON keys and values, however deep, without recursion", () => {
    let deep: unknown = "x\u0000";
    for (let i = 0; i < 100_000; i++) deep = [deep];
    expect(jsonTextProblem(deep)).toMatch(/NUL/);
    expect(jsonTextProblem({ ["key\uD800"]: 1 })).toMatch(/surrogate/);
    expect(jsonTextProblem({ name: "Vell Ridge", months: [{ tMaxC: 3 }] })).toBeNull();
  });

  it("looks at form text but not at file bytes", () => {
    const form = new FormData();
    form.append("photo", new File([new Uint8Array([0, 0, 0])], "m.png"));
    expect(formProblem(form)).toBeNull();
    form.append("name", "a\u0000");
    expect(formProblem(form)).toMatch(/"name" contains a NUL/);
  });

  it("refuses a NUL in the address's path or query", () => {
    expect(addressProblem(new URL("http://app.test/sites/abc%00def"))).toMatch(/NUL/);
    expect(addressProblem(new URL("http://app.test/catalogue?q=a%00"))).toMatch(/"q"/);
    expect(addressProblem(new URL("http://app.test/catalogue?q=%25%27"))).toBeNull();
  });
});

describe("request bodies", () => {
  it("refuses a body above the limit, declared or not, with 413", async () => {
    const big = new Uint8Array(MAX_BODY_BYTES + 1).fill(65);
    expect((await bodyProblem(post(big, "application/x-www-form-urlencoded")))?.status).toBe(413);
    const streamed = new Request("http://app.test/x", {
      method: "POST",
      headers: { "Content-Type": "application/json" },
      body: new ReadableStream({ start: (c) => (c.enqueue(big), c.close()) }),
      duplex: "half",
    } as RequestInit);
    expect((await bodyProblem(streamed))?.status).toBe(413);
  });

  it("refuses forms and JSON with unstorable text or runaway names, and leaves the body for the route", async () => {
    expect(await bodyProblem(post("name=a%00b", "application/x-www-form-urlencoded"))).toMatchObject({ status: 400 });
    expect(await bodyProblem(post("junk%5B99999999%5D=1", "application/x-www-form-urlencoded"))).toMatchObject({ status: 400 });
    expect(await bodyProblem(post('{"name":"\\ud800"}', "application/json"))).toMatchObject({ status: 400 });
    const fine = post("name=Vell+Ridge&months%5B0%5D.tMaxC=3", "application/x-www-form-urlencoded");
    expect(await bodyProblem(fine)).toBeNull();
    expect((await fine.formData()).get("name")).toBe("Vell Ridge");
  });

  it("leaves bodies it cannot parse, and other types, to the route", async () => {
    expect(await bodyProblem(post("{not json", "application/json"))).toBeNull();
    expect(await bodyProblem(post("a,b\n\u0000,1", "text/csv"))).toBeNull();
  });
});
