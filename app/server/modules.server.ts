// Catalogue modules (shared by all teams).
import { db } from "./db.server";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export function isUuid(value: string) {
  return UUID.test(value);
}

export async function listModules({ search, limit, offset }: { search: string; limit: number; offset: number }) {
  // Merged duplicates are hidden: their readings and their users moved to the model that stayed.
  let query = db.selectFrom("pv_module").where("merged_into", "is", null);
  if (search) {
    const pattern = `%${search.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    query = query.where((eb) => eb.or([eb("maker", "ilike", pattern), eb("model", "ilike", pattern)]));
  }
  const [items, total] = await Promise.all([
    query.selectAll().orderBy("maker").orderBy("model").limit(limit).offset(offset).execute(),
    query.select((eb) => eb.fn.countAll<number>().as("count")).executeTakeFirstOrThrow(),
  ]);
  return { items, total: Number(total.count) };
}

export async function findModule(id: string) {
  if (!isUuid(id)) return undefined;
  return db.selectFrom("pv_module").selectAll().where("id", "=", id).executeTakeFirst();
}
