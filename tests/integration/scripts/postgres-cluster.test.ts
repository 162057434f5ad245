// The project's own cluster helper must tell a live server from a pid file left by a killed one
// (a session's processes are killed, not stopped, before the next run; CI then found "running").
import { chownSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { execFileSync } from "node:child_process";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import { findPostgresBinDir, isClusterRunning } from "../../../scripts/lib/postgres-cluster";
import { TEST_CLUSTER } from "../../setup/test-env";

const binDir = findPostgresBinDir();
let dir: string | null = null;

afterEach(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
  dir = null;
});

function fakeDataDir(pid: number) {
  dir = mkdtempSync(join(tmpdir(), "kw-stale-pg-"));
  const version = readFileSync(join(TEST_CLUSTER.dataDir, "PG_VERSION"), "utf8");
  writeFileSync(join(dir, "PG_VERSION"), version);
  // A pid that no process has: what a killed postmaster leaves behind.
  writeFileSync(join(dir, "postmaster.pid"), `${pid}\n${dir}\n1700000000\n59999\n`);
  if (process.getuid?.() === 0) {
    const uid = Number(execFileSync("id", ["-u", "postgres"], { encoding: "utf8" }));
    const gid = Number(execFileSync("id", ["-g", "postgres"], { encoding: "utf8" }));
    for (const path of [dir, join(dir, "PG_VERSION"), join(dir, "postmaster.pid")]) chownSync(path, uid, gid);
  }
  return dir;
}

describe("isClusterRunning", () => {
  it("says the test cluster (started by the global setup) is running", () => {
    expect(isClusterRunning(TEST_CLUSTER, binDir)).toBe(true);
  });

  it("does not mistake a stale postmaster.pid for a running server", () => {
    const dataDir = fakeDataDir(4_194_000);
    expect(isClusterRunning({ dataDir, port: 59999 }, binDir)).toBe(false);
  });
});
