// The start lock: of two starts on one app port only one gets it; a lock whose process has ended is
// taken over. Uses an app port no real start uses, and removes its lock file.
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { afterEach, describe, expect, it } from "vitest";
import { claimLock, lockFileFor, removeLock } from "../../../scripts/lib/start-lock";

const ports = { app: 64999, smtp: 64998, mailHttp: 64997, payments: 64996 };

afterEach(() => removeLock(ports.app));

describe("the npm start lock", () => {
  it("is taken once: a second claim names the copy that holds it", () => {
    expect(claimLock(ports, 64995)).toBeNull();
    expect(JSON.parse(readFileSync(lockFileFor(ports.app), "utf8"))).toEqual({ pid: process.pid, app: ports.app, pgPort: 64995 });
    expect(claimLock(ports, 64995)).toEqual({ pid: process.pid, app: ports.app, pgPort: 64995 });
  });

  it("takes over a lock left by a process that has ended", () => {
    // Process ids above the kernel's pid_max (at most 4 194 304) are never alive.
    writeFileSync(lockFileFor(ports.app), JSON.stringify({ pid: 4_194_305, app: ports.app, pgPort: 1 }));
    expect(claimLock(ports, 64995)).toBeNull();
    expect(JSON.parse(readFileSync(lockFileFor(ports.app), "utf8")).pid).toBe(process.pid);
  });

  it("reads an older lock holding the process id alone", () => {
    writeFileSync(lockFileFor(ports.app), String(process.pid));
    expect(claimLock(ports, 64995)).toEqual({ pid: process.pid, app: ports.app });
    removeLock(ports.app);
    expect(existsSync(lockFileFor(ports.app))).toBe(false);
  });
});
