// Child processes started by scripts/start.ts and scripts/test.ts, stopped together on exit.
import { spawn, type ChildProcess } from "node:child_process";
import net from "node:net";

export interface Managed {
  name: string;
  child: ChildProcess;
}

const children: Managed[] = [];

export function startProcess(name: string, command: string, args: string[], env: NodeJS.ProcessEnv, { quiet = false } = {}) {
  const child = spawn(command, args, { env: { ...process.env, ...env }, stdio: quiet ? ["ignore", "ignore", "pipe"] : ["ignore", "inherit", "inherit"] });
  if (quiet) child.stderr?.on("data", (chunk) => process.stderr.write(`[${name}] ${chunk}`));
  const managed = { name, child };
  children.push(managed);
  return managed;
}

export function stopAll(signal: NodeJS.Signals = "SIGTERM") {
  for (const { child } of children.splice(0).reverse()) {
    if (child.exitCode === null && child.signalCode === null) child.kill(signal);
  }
}

export function isPortInUse(port: number, host = "127.0.0.1"): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect({ port, host });
    socket.once("connect", () => {
      socket.destroy();
      resolve(true);
    });
    socket.once("error", () => resolve(false));
  });
}

export async function waitForHttp(url: string, timeoutMs = 30000) {
  const deadline = Date.now() + timeoutMs;
  let lastError: unknown;
  while (Date.now() < deadline) {
    try {
      const res = await fetch(url);
      if (res.status < 500) return;
      lastError = new Error(`status ${res.status}`);
    } catch (error) {
      lastError = error;
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`${url} did not answer within ${timeoutMs} ms: ${String(lastError)}`);
}
