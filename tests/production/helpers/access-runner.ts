// Sends one visitor's request to the app as a browser on the public address would, checks the answer
// against the table's outcome and against the words that visitor must never see, and keeps a tally.
import type { Body } from "../access-matrix.table";
import { leakedWords, mismatch, type Outcome } from "./access-check";
import type { Actor, World } from "./access-world";
import { call, type HttpAnswer } from "./http";
import { PUBLIC_HOST, PUBLIC_URL } from "./throwaway-stack";

export interface Probe {
  actor: Actor;
  /** Sent instead of the actor's session cookie (e.g. a team API key); canaries stay the actor's. */
  headers?: Record<string, string>;
  cookie?: string;
  method: "GET" | "POST";
  url: string;
  body?: Body;
  /** The page's URL when `url` is its single-fetch `.data` twin. */
  pageUrl?: string;
  expect: Outcome;
  mayShow?: string[];
}

export function createRunner(port: number, world: World) {
  const problems: string[] = [];
  const tally = { GET: 0, DATA: 0, POST: 0, slowestMs: 0, slowest: "" };

  async function probe(p: Probe): Promise<HttpAnswer> {
    const cookie = p.cookie ?? world.cookies[p.actor];
    const headers: Record<string, string> = { ...(cookie ? { Cookie: cookie } : {}), ...p.headers };
    if (p.method === "POST") headers.Origin = PUBLIC_URL;
    const body = p.body && "form" in p.body ? { form: p.body.form } : p.body ? { json: p.body.json } : {};
    const answer = await call(port, PUBLIC_HOST, p.url, { method: p.method, headers, timeoutMs: 20_000, ...body });
    const label = `${p.actor} ${p.method} ${p.url}`;
    const wrong = mismatch(answer, p.expect, p.pageUrl ?? p.url, p.pageUrl !== undefined);
    if (wrong) problems.push(`${label}: ${wrong}`);
    const leaked = leakedWords(answer, p.actor, world).filter((word) => !p.mayShow?.includes(word));
    if (leaked.length) problems.push(`${label}: LEAK of ${leaked.join(", ")} (status ${answer.status})`);
    if (answer.status >= 500) problems.push(`${label}: SERVER ERROR ${answer.status}`);
    tally[p.pageUrl ? "DATA" : p.method] += 1;
    if (answer.ms > tally.slowestMs) Object.assign(tally, { slowestMs: answer.ms, slowest: label });
    return answer;
  }

  /** Runs probes a few at a time: the server is one process on a 2-core machine. */
  async function probeAll(probes: Probe[], concurrency = 3) {
    let next = 0;
    async function worker() {
      while (next < probes.length) await probe(probes[next++]);
    }
    await Promise.all(Array.from({ length: concurrency }, worker));
  }

  return { probe, probeAll, problems, tally };
}
