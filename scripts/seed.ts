// npm run seed — loads the demo scenario into DATABASE_URL (default: the `npm start` database).
import { DEV_DATABASE_URL } from "./lib/dev-cluster";

process.env.DATABASE_URL ??= DEV_DATABASE_URL;
const { seedDemo } = await import("./lib/seed-demo");
await seedDemo(console.log);
const { db } = await import("../app/server/db.server");
await db.destroy();
console.log("Demo data is in place.");
