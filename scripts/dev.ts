// npm run dev — like npm start, but the app runs under the React Router dev server with hot reload.
import { DEMO_PASSWORD, DEMO_USERS } from "../data/demo/people";
import { banner, bootLocalStack, LOCAL_PORTS } from "./lib/local-stack";
import { startProcess } from "./lib/processes";

const stack = await bootLocalStack(LOCAL_PORTS);
const dev = startProcess("dev", "node_modules/.bin/react-router", ["dev", "--host", "127.0.0.1", "--port", String(LOCAL_PORTS.app), "--strictPort"], {
  ...stack.env,
  NODE_ENV: "development",
});
dev.child.on("exit", () => stack.isStopping() || stack.shutdown(1));
const demo = DEMO_USERS.map((u) => `  ${u.role.padEnd(10)} ${u.email.padEnd(32)} ${u.note}`);
console.log(banner(LOCAL_PORTS, stack.seeded, [...demo, `  (password for all: "${DEMO_PASSWORD}")`]));
