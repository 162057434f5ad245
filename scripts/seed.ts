// npm run seed — loads the demo scenario into DATABASE_URL (default: the `npm start` database).
//   npm run seed -- --scale 10000   also adds 10 000 generated modules and 100 000 approved
//                                   readings for the benchmark (scripts/lib/seed-scale.ts).
import { DEV_DATABASE_URL } from "./lib/dev-cluster";

function parseArgs(argv: string[]) {
  let scale: number | null = null;
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    const value = arg === "--scale" ? argv[++i] : arg.startsWith("--scale=") ? arg.slice("--scale=".length) : undefined;
    if (value === undefined) throw new Error(`Unknown argument "${arg}". Usage: npm run seed [-- --scale N]`);
    const n = Number(value);
    if (!Number.isInteger(n) || n < 1 || n > 1_000_000) throw new Error(`--scale takes a whole number of modules from 1 to 1 000 000 (got "${value}").`);
    scale = n;
  }
  return { scale };
}

let args: ReturnType<typeof parseArgs>;
try {
  args = parseArgs(process.argv.slice(2));
} catch (error) {
  console.error((error as Error).message);
  process.exit(2);
}

process.env.DATABASE_URL ??= DEV_DATABASE_URL;
const { seedDemo } = await import("./lib/seed-demo");
await seedDemo(console.log);
const { db } = await import("../app/server/db.server");
if (args.scale) {
  const { seedScale } = await import("./lib/seed-scale");
  await seedScale(db, args.scale, console.log);
}
await db.destroy();
console.log("Demo data is in place.");
