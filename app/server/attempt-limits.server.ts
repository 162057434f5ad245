// Counting attempts in PostgreSQL: one fixed window per bucket, counted with one atomic upsert so
// that concurrent requests on any number of app instances can never all slip under the limit. The
// database's clock decides windows, so instances with drifting clocks still agree.
import { createHash } from "node:crypto";
import { sql } from "kysely";
import { db } from "./db.server";

export interface AttemptRule {
  max: number;
  windowSeconds: number;
}

export type AttemptDecision = { allowed: true } | { allowed: false; retryAfterSeconds: number };

/** Buckets are stored hashed: the table never holds an e-mail address or a client address. */
export function attemptBucket(scope: string, kind: "account" | "ip", value: string) {
  return `${scope}:${kind}:${createHash("sha256").update(value).digest("hex")}`;
}

/** Counts one attempt; refused once the window holds more than `max` of them. */
export async function consumeAttempt(bucket: string, rule: AttemptRule): Promise<AttemptDecision> {
  const window = sql`make_interval(secs => ${rule.windowSeconds})`;
  const { rows } = await sql<{ hits: number; retry_after: number; fresh: boolean }>`
    insert into auth_attempt_limit as l (bucket, hits, window_started_at) values (${bucket}, 1, now())
    on conflict (bucket) do update set
      hits = case when l.window_started_at <= now() - ${window} then 1 else l.hits + 1 end,
      window_started_at = case when l.window_started_at <= now() - ${window} then now() else l.window_started_at end
    returning hits,
      ceil(extract(epoch from (window_started_at + ${window} - now())))::int as retry_after,
      window_started_at = now() as fresh`.execute(db);
  const row = rows[0];
  if (row.fresh) await pruneEndedWindows();
  if (row.hits <= rule.max) return { allowed: true };
  return { allowed: false, retryAfterSeconds: Math.max(1, row.retry_after) };
}

/** Takes back one attempt (it turned out not to count, e.g. a sign-in that succeeded). */
export async function refundAttempt(bucket: string) {
  await sql`update auth_attempt_limit set hits = greatest(hits - 1, 0) where bucket = ${bucket}`.execute(db);
}

export async function clearAttempts(bucket: string) {
  await sql`delete from auth_attempt_limit where bucket = ${bucket}`.execute(db);
}

/** Every window is at most an hour long; a day-old row is dead weight. */
async function pruneEndedWindows() {
  await sql`delete from auth_attempt_limit where window_started_at < now() - interval '1 day'`.execute(db);
}
