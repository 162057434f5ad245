// npm run db:migrate — applies pending migrations to DATABASE_URL (default: the `npm start` database).
import { migrateToLatest } from "./lib/migrator";
import { DEV_DATABASE_URL } from "./lib/dev-cluster";

await migrateToLatest(process.env.DATABASE_URL ?? DEV_DATABASE_URL);
