// Team API keys: shown once at creation, stored as SHA-256 hashes, revocable.
import { createHash, randomBytes } from "node:crypto";
import { db } from "./db.server";

const KEY_PREFIX = "kw_";

function hashKey(key: string) {
  return createHash("sha256").update(key).digest("hex");
}

/**
 * Every /api/v1 request authenticates, and looking the key up was a PostgreSQL round trip each time
 * (one of the yield API's two, measured with `npm run bench`). A live key's team is remembered here
 * for a few seconds. Revoking through this process forgets the key at once; another
 * instance stops accepting it within RECENT_KEY_MS. Unknown and revoked keys are never remembered.
 */
const RECENT_KEY_MS = 5_000;
const RECENT_KEY_LIMIT = 1_000;
const recentKeys = new Map<string, { keyId: string; teamId: string; until: number }>();
/** Counts revocations, so that a lookup that read the row before a revocation does not remember it. */
let revocations = 0;

export async function createApiKey(teamId: string, name: string, createdBy: string) {
  const key = `${KEY_PREFIX}${randomBytes(32).toString("base64url")}`;
  const row = await db
    .insertInto("team_api_key")
    .values({ team_id: teamId, name, prefix: key.slice(0, 10), key_hash: hashKey(key), created_by: createdBy })
    .returning(["id", "name", "prefix"])
    .executeTakeFirstOrThrow();
  return { ...row, key };
}

export function listApiKeys(teamId: string) {
  return db
    .selectFrom("team_api_key")
    .select(["id", "name", "prefix", "created_at", "last_used_at", "revoked_at"])
    .where("team_id", "=", teamId)
    .orderBy("created_at", "desc")
    .execute();
}

/** Revokes a key of this team only; returns false when no such live key exists. */
export async function revokeApiKey(teamId: string, keyId: string) {
  const result = await db
    .updateTable("team_api_key")
    .set({ revoked_at: new Date() })
    .where("team_id", "=", teamId)
    .where("id", "=", keyId)
    .where("revoked_at", "is", null)
    .executeTakeFirst();
  revocations++;
  for (const [hash, entry] of recentKeys) if (entry.keyId === keyId) recentKeys.delete(hash);
  return Number(result.numUpdatedRows) > 0;
}

/** Recording use at most once a minute keeps a busy integration from writing on every request. */
const LAST_USED_RESOLUTION_MS = 60_000;

export async function findTeamByApiKey(key: string) {
  if (!key.startsWith(KEY_PREFIX) || key.length > 200) return null;
  const hash = hashKey(key);
  const recent = recentKeys.get(hash);
  if (recent && recent.until > Date.now()) return { keyId: recent.keyId, teamId: recent.teamId };
  recentKeys.delete(hash);
  const revocationsBefore = revocations;
  const row = await db
    .selectFrom("team_api_key")
    .select(["id", "team_id", "last_used_at"])
    .where("key_hash", "=", hash)
    .where("revoked_at", "is", null)
    .executeTakeFirst();
  if (!row) return null;
  const lastUsed = row.last_used_at ? new Date(row.last_used_at).getTime() : 0;
  if (Date.now() - lastUsed > LAST_USED_RESOLUTION_MS) {
    await db.updateTable("team_api_key").set({ last_used_at: new Date() }).where("id", "=", row.id).execute();
  }
  if (revocations === revocationsBefore) {
    // The oldest entry makes room: a Map iterates in insertion order.
    if (recentKeys.size >= RECENT_KEY_LIMIT) recentKeys.delete(recentKeys.keys().next().value!);
    recentKeys.set(hash, { keyId: row.id, teamId: row.team_id, until: Date.now() + RECENT_KEY_MS });
  }
  return { keyId: row.id, teamId: row.team_id };
}
