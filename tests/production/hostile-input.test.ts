// Hostile input against the production server (express, body parsing, React Router, PostgreSQL): a
// generated corpus of malformed requests for every form action and API route. Each must get a
// clear 4xx (JSON with a message under /api/, the form again with its messages or an error page
// elsewhere), never a 5xx, and leave every table's row count as it was. Cross-origin writes are
// refused at the door. Markup saved through valid forms is shown escaped on every page.
// Tables that may grow under a refused request, each named by its case: auth_attempt_limit (failed
// sign-ins are counted per address, by design) and better-auth's rateLimit counter.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { HostileCase } from "./helpers/hostile-corpus";
import { buildHostileCorpus, countByFamily, CROSS_ORIGIN_FAMILY } from "./helpers/hostile-corpus-all";
import { send } from "./helpers/hostile-http";
import { judge } from "./helpers/hostile-judge";
import { startHostileWorld, type HostileWorld } from "./helpers/hostile-setup";
import { markupProblems, saveMarkup } from "./helpers/stored-markup";
import { PUBLIC_URL } from "./helpers/throwaway-stack";

let world: HostileWorld;
let corpus: HostileCase[];

beforeAll(async () => {
  world = await startHostileWorld();
  corpus = buildHostileCorpus(world.ids);
}, 120_000);

afterAll(async () => {
  await world?.stop();
});

function headersFor(c: HostileCase): Record<string, string> {
  const headers: Record<string, string> = { ...c.headers };
  if (c.contentType) headers["Content-Type"] = c.contentType;
  if (c.method === "POST" && c.origin !== null) headers.Origin = c.origin ?? PUBLIC_URL;
  if (c.actor === "apiKey") headers.Authorization = `Bearer ${world.apiKey}`;
  else if (world.cookies[c.actor]) headers.Cookie = world.cookies[c.actor];
  return headers;
}

async function run(cases: HostileCase[]) {
  const failures: string[] = [];
  // Nothing else writes while the corpus runs, so one request's "after" is the next one's "before".
  let before = await world.database.rowCounts();
  for (const c of cases) {
    let problems: string[];
    try {
      const answer = await send(world.port, { method: c.method, path: c.path, body: c.body, chunked: c.chunked, headers: headersFor(c) });
      const after = await world.database.rowCounts();
      problems = judge(c, answer, before, after);
      before = after;
    } catch (error) {
      problems = [`no answer: ${(error as Error).message}`];
      before = await world.database.rowCounts();
    }
    if (problems.length) failures.push(`[${c.family}] ${c.method} ${c.path.slice(0, 90)} — ${c.label}: ${problems.join("; ")}`);
  }
  return failures;
}

describe("hostile input over HTTP", () => {
  it("has a corpus of at least 200 malformed requests covering every route family", () => {
    const families = countByFamily(corpus);
    console.log(`hostile corpus: ${corpus.length} requests\n${families.map(([f, n]) => `  ${String(n).padStart(4)}  ${f}`).join("\n")}`);
    expect(corpus.length).toBeGreaterThanOrEqual(200);
    expect(families.map(([f]) => f)).toEqual(
      expect.arrayContaining(["sign-in / sign-up / reset", "quote-access", "team", "admin", "catalogue", "field readings", "review", "sites", "load sheets"]),
    );
    expect(families.map(([f]) => f)).toEqual(
      expect.arrayContaining(["kit plans", "sourcing", "quotes", "my quotes", "api/v1", "payments webhook", CROSS_ORIGIN_FAMILY]),
    );
  });

  it("answers every malformed request with a clear 4xx and writes nothing", async () => {
    const failures = await run(corpus.filter((c) => c.family !== CROSS_ORIGIN_FAMILY));
    const serverErrors = world.stack.instances[0].output.join("").slice(-6000);
    expect(failures, `${failures.length} failures\n${failures.join("\n")}\n--- server log (5xx only) ---\n${serverErrors}`).toEqual([]);
  }, 300_000);

  it("refuses writes from another origin, or from none, with 403 before any route", async () => {
    const cases = corpus.filter((c) => c.family === CROSS_ORIGIN_FAMILY);
    expect(cases.length).toBeGreaterThanOrEqual(5);
    expect(await run(cases)).toEqual([]);
  });

  it("shows markup saved through valid forms escaped on every page that shows it", async () => {
    const pages = await saveMarkup(world);
    const problems: string[] = [];
    for (const page of pages) {
      const cookie = world.cookies[page.actor];
      problems.push(...markupProblems(page, await send(world.port, { method: "GET", path: page.path, headers: cookie ? { Cookie: cookie } : {} })));
    }
    expect(problems).toEqual([]);
    expect(pages.length).toBeGreaterThanOrEqual(15);
  });

  it("keeps running", () => {
    const instance = world.stack.instances[0];
    expect(instance.child.exitCode, instance.output.join("").slice(-2000)).toBeNull();
  });
});
