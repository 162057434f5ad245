// npm start — the whole product on this machine: its own PostgreSQL (installed from Debian when
// absent), migrations, demo data on an empty database, the local fakes and the production server.
import { spawnSync } from "node:child_process";
import { DEMO_PASSWORD, DEMO_USERS } from "../data/demo/people";
import { banner, bootLocalStack, LOCAL_PORTS } from "./lib/local-stack";
import { startAppServer } from "./lib/services";

const stack = await bootLocalStack(LOCAL_PORTS);
try {
  if (process.env.KITWRIGHT_SKIP_BUILD !== "1") {
    const build = spawnSync("node_modules/.bin/react-router", ["build"], { stdio: ["ignore", "ignore", "inherit"] });
    if (build.status !== 0) throw new Error("The production build failed (see above).");
  }
  const server = await startAppServer(stack.env, LOCAL_PORTS);
  server.child.on("exit", (code) => {
    if (stack.isStopping()) return;
    console.error(`The app server stopped (exit ${code}).`);
    stack.shutdown(1);
  });
  const demo = DEMO_USERS.map((u) => `  ${u.role.padEnd(10)} ${u.email.padEnd(32)} ${u.note}`);
  console.log(banner(LOCAL_PORTS, stack.seeded, [...demo, `  (password for all: "${DEMO_PASSWORD}")`]));
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
  stack.shutdown(1);
}
